/**
 * The renderer's only way to data: `call(operation, input)`. In the Electron window it goes through the
 * preload bridge (window.pairwright), in a browser tab through the host's `POST /api/<operation>`; the browser
 * sends the host's HttpOnly session cookie (set when the login address printed in the terminal was opened). Types come from the one contract in shared-model/api.
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

export type Transport = 'desktop' | 'browser';

export function transport(): Transport {
  return window.pairwright ? 'desktop' : 'browser';
}

export async function call<Name extends OperationName>(
  name: Name,
  input: OperationInput<Name>,
): Promise<ApiResult<OperationOutput<Name>>> {
  const bridge = window.pairwright;
  if (bridge) {
    const operation = bridge[name];
    if (!operation)
      return {
        ok: false,
        error: { code: 'unknown_operation', message: `operation ${name} is not exposed by this window` },
      };
    return (await operation(input)) as ApiResult<OperationOutput<Name>>;
  }
  let response: Response;
  try {
    response = await fetch(`./api/${encodeURIComponent(name)}`, {
      method: 'POST',
      credentials: 'same-origin',
      headers: { 'content-type': 'application/json', 'x-pairwright-call': '1' },
      body: JSON.stringify(input ?? {}),
    });
  } catch (error) {
    return {
      ok: false,
      error: {
        code: 'internal',
        message: `the Pairwright host did not answer (${String(error)}); is "npm run serve" still running?`,
      },
    };
  }
  if (response.status === 401) {
    const message = 'this browser is not logged in to the Pairwright host; open the address printed in its terminal';
    return { ok: false, error: { code: 'forbidden', message } };
  }
  try {
    return (await response.json()) as ApiResult<OperationOutput<Name>>;
  } catch (error) {
    return {
      ok: false,
      error: {
        code: 'internal',
        message: `unreadable answer from the host (HTTP ${response.status}): ${String(error)}`,
      },
    };
  }
}

/** Calls an operation and throws its error message; for places where a failure is shown as a banner. */
export async function callOrThrow<Name extends OperationName>(
  name: Name,
  input: OperationInput<Name>,
): Promise<OperationOutput<Name>> {
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
