/**
 * The one entry point of every transport (IPC, browser host, CLI): name check → zod validation →
 * service function → `ApiResult`. Domain errors become error values; anything unexpected is logged
 * with its stack and answered as an "internal" error naming the operation — never swallowed.
 */
import { isOperationName, type OperationName, type OperationOutput } from '../../shared-model/api/contract';
import { DomainError, fail, ok, type ApiResult } from '../../shared-model/api/result';
import { validateInput } from '../../shared-model/api/validate';
import type { Handler, ServiceContext } from './context';
import { handlers } from './registry';

export async function dispatch(context: ServiceContext, name: string, rawInput: unknown): Promise<ApiResult<unknown>> {
  if (!isOperationName(name)) return fail('unknown_operation', `unknown operation "${name}"`);
  return dispatchKnown(context, name, rawInput);
}

export async function dispatchKnown<Name extends OperationName>(
  context: ServiceContext,
  name: Name,
  rawInput: unknown,
): Promise<ApiResult<OperationOutput<Name>>> {
  const validated = validateInput(name, rawInput);
  if (!validated.ok) return validated;
  const handler = handlers[name] as Handler<Name>;
  try {
    return ok(await handler(validated.value, context));
  } catch (error) {
    return errorToResult(name, error);
  }
}

function errorToResult(name: string, error: unknown): { ok: false; error: { code: DomainError['code']; message: string; field?: string } } {
  if (error instanceof DomainError) return fail(error.code, error.message, error.field);
  if (error instanceof RangeError) {
    // Model code signals bad arguments this way; the message names the argument.
    console.error(`[pairwright] ${name}:`, error);
    return fail('invalid_input', error.message);
  }
  console.error(`[pairwright] ${name} failed:`, error);
  const message = error instanceof Error ? error.message : String(error);
  return fail('internal', `${name} failed: ${message}`);
}
