/**
 * The renderer's only way to data: `call(operation, input)`. In the Electron window it goes through the
 * preload bridge (window.pairwright), in a browser tab through the host's `POST /api/<operation>` with the
 * per-start token the host wrote into the page. Types come from the one contract in shared-model/api.
 */
import type { OperationInput, OperationName, OperationOutput } from '../../../shared-model/api/contract';
import type { ApiResult } from '../../../shared-model/api/result';

type Bridge = Record<string, (input: unknown) => Promise<unknown>>;

declare global {
  interface Window {
    pairwright?: Bridge;
    pairwrightDesktop?: { printToPdf(name: string): Promise<ApiResult<{ saved: string | null }>> };
  }
}

function hostToken(): string | null {
  return document.querySelector('meta[name="pairwright-token"]')?.getAttribute('content') ?? null;
}

export type Transport = 'desktop' | 'browser';

export function transport(): Transport {
  return window.pairwright ? 'desktop' : 'browser';
}

export async function call<Name extends OperationName>(name: Name, input: OperationInput<Name>): Promise<ApiResult<OperationOutput<Name>>> {
  const bridge = window.pairwright;
  if (bridge) {
    const operation = bridge[name];
    if (!operation) return { ok: false, error: { code: 'unknown_operation', message: `operation ${name} is not exposed by this window` } };
    return (await operation(input)) as ApiResult<OperationOutput<Name>>;
  }
  const token = hostToken();
  if (!token) return { ok: false, error: { code: 'forbidden', message: 'no session token in this page; open the address printed by "npm run serve"' } };
  let response: Response;
  try {
    response = await fetch(`./api/${encodeURIComponent(name)}`, {
      method: 'POST',
      headers: { 'content-type': 'application/json', 'x-pairwright-token': token },
      body: JSON.stringify(input ?? {}),
    });
  } catch (error) {
    return { ok: false, error: { code: 'internal', message: `the Pairwright host did not answer (${String(error)}); is "npm run serve" still running?` } };
  }
  try {
    return (await response.json()) as ApiResult<OperationOutput<Name>>;
  } catch (error) {
    return { ok: false, error: { code: 'internal', message: `unreadable answer from the host (HTTP ${response.status}): ${String(error)}` } };
  }
}

/** Calls an operation and throws its error message; for places where a failure is shown as a banner. */
export async function callOrThrow<Name extends OperationName>(name: Name, input: OperationInput<Name>): Promise<OperationOutput<Name>> {
  const result = await call(name, input);
  if (!result.ok) throw new Error(result.error.message);
  return result.value;
}

/** Saves the current page as PDF (desktop) or opens the print dialog (browser; the print stylesheet applies). */
export async function printPage(suggestedFileName: string): Promise<string | null> {
  const desktop = window.pairwrightDesktop;
  if (desktop) {
    const result = await desktop.printToPdf(suggestedFileName);
    if (!result.ok) throw new Error(result.error.message);
    return result.value.saved;
  }
  window.print();
  return null;
}
