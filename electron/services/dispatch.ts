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
  try {
    return ok(await runOperation(context, name, rawInput));
  } catch (error) {
    return errorToResult(name, error, rawInput);
  }
}

/**
 * The one path from an operation name and raw input to its service: zod validation (with defaults), then
 * the service function. Bad input is thrown as a DomainError naming the field. `dispatchKnown` turns what
 * this throws into an `ApiResult`; a workflow that runs several operations inside one store transaction
 * (the demo campaign) calls `runOperationInTransaction`.
 */
export function runOperation<Name extends OperationName>(
  context: ServiceContext,
  name: Name,
  rawInput: unknown,
): OperationOutput<Name> | Promise<OperationOutput<Name>> {
  const validated = validateInput(name, rawInput);
  if (!validated.ok) throw new DomainError(validated.error.code, validated.error.message, validated.error.field);
  const handler = handlers[name] as Handler<Name>;
  return handler(validated.value, context);
}

/**
 * `runOperation` for a caller inside a better-sqlite3 transaction, which cannot span an `await`: the
 * service must answer synchronously (every store-backed service does; a long job returns its id at once).
 */
export function runOperationInTransaction<Name extends OperationName>(
  context: ServiceContext,
  name: Name,
  rawInput: unknown,
): OperationOutput<Name> {
  if (!context.store.db.inTransaction) throw new Error(`${name}: runOperationInTransaction needs an open transaction`);
  const output = runOperation(context, name, rawInput);
  if (output instanceof Promise) {
    void output.catch((error: unknown) => console.error(`[pairwright] ${name} (refused in a transaction):`, error));
    throw new Error(`${name} answers asynchronously, so it cannot run inside a store transaction`);
  }
  return output;
}

/** The top-level field of the input with the longest text or list (the likeliest cause of an allocation failure). */
function largestField(input: unknown): string | null {
  if (typeof input !== 'object' || input === null) return null;
  let best: string | null = null;
  let bestSize = -1;
  for (const [key, value] of Object.entries(input)) {
    const size =
      typeof value === 'string' || Array.isArray(value)
        ? value.length
        : typeof value === 'object' && value !== null
          ? Object.keys(value).length
          : 0;
    if (size > bestSize) [best, bestSize] = [key, size];
  }
  return best;
}

function errorToResult(
  name: string,
  error: unknown,
  input: unknown,
): { ok: false; error: { code: DomainError['code']; message: string; field?: string } } {
  if (error instanceof DomainError) return fail(error.code, error.message, error.field);
  if (error instanceof RangeError) {
    console.error(`[pairwright] ${name}:`, error);
    // The engine's own RangeErrors (an array too large to allocate, a stack too deep) name no argument: name the
    // input's largest field instead, so the user knows what to shrink.
    if (/typed array length|Array buffer allocation|Invalid array length|call stack size/i.test(error.message)) {
      const field = largestField(input);
      return fail(
        'invalid_input',
        `${field ?? 'the input'} is too large or too deeply nested to compute (${error.message})`,
        field ?? undefined,
      );
    }
    // Model code signals bad arguments this way; the message names the argument.
    return fail('invalid_input', error.message);
  }
  console.error(`[pairwright] ${name} failed:`, error);
  const message = error instanceof Error ? error.message : String(error);
  return fail('internal', `${name} failed: ${message}`);
}
