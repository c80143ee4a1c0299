/** Every API operation answers with a value, never a thrown error: errors must survive IPC and HTTP intact. */
export interface ApiError {
  /** Machine-readable kind, e.g. "invalid_input", "not_found", "conflict", "internal". */
  code: ApiErrorCode;
  /** One human sentence naming the field, row or value at fault. */
  message: string;
  /** Dotted path of the input field at fault, when there is one (the UI shows the message beside it). */
  field?: string;
}

export type ApiErrorCode =
  | 'invalid_input'
  | 'not_found'
  | 'conflict'
  | 'unsupported'
  | 'cancelled'
  | 'unknown_operation'
  | 'forbidden'
  | 'internal';

export type ApiResult<T> = { ok: true; value: T } | { ok: false; error: ApiError };

export const ok = <T>(value: T): ApiResult<T> => ({ ok: true, value });

export const fail = (code: ApiErrorCode, message: string, field?: string): { ok: false; error: ApiError } => ({
  ok: false,
  error: field === undefined ? { code, message } : { code, message, field },
});

/**
 * Thrown inside services and model code to stop with a user-facing error;
 * the dispatcher turns it into an `ApiResult` failure. Model code throws it for bad arguments.
 */
export class DomainError extends Error {
  constructor(
    readonly code: ApiErrorCode,
    message: string,
    readonly field?: string,
  ) {
    super(message);
    this.name = 'DomainError';
  }
}

export const invalid = (field: string, message: string): DomainError =>
  new DomainError('invalid_input', message, field);
