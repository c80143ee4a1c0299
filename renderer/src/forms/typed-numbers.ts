/**
 * Typed numbers in forms: every view reads its number fields through these, which call the one reader
 * (shared-model/text/user-number.ts) and, on a refusal, name the input so the message shows beside it.
 * Inside `readForm(() => …)` a form reads all its fields in order; the first refusal becomes the result.
 */
import type { ApiError } from '../../../shared-model/api/result';
import { readOptionalUserNumber, readUserNumber } from '../../../shared-model/text/user-number';

class FieldRefusal extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(message);
    this.name = 'FieldRefusal';
  }
}

/** The number typed in input `field` (shown to the user as `label`); empty text is refused. */
export function fieldNumber(text: string, field: string, label: string): number {
  const result = readUserNumber(text, label);
  if (!result.ok) throw new FieldRefusal(field, result.message);
  return result.value;
}

/** As `fieldNumber`, but empty text means "not given" (null). */
export function optionalFieldNumber(text: string, field: string, label: string): number | null {
  const result = readOptionalUserNumber(text, label);
  if (!result.ok) throw new FieldRefusal(field, result.message);
  return result.value ?? null;
}

export type FormReading<T> = { ok: true; value: T } | { ok: false; error: ApiError & { field: string } };

/** Runs `read` (which calls the readers above); a refusal comes back as the error to show beside its input. */
export function readForm<T>(read: () => T): FormReading<T> {
  try {
    return { ok: true, value: read() };
  } catch (error) {
    if (error instanceof FieldRefusal)
      return { ok: false, error: { code: 'invalid_input', message: error.message, field: error.field } };
    throw error;
  }
}
