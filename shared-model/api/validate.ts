import type { z } from 'zod';
import { operations, type OperationName, type ValidatedInput } from './contract';
import type { ApiError } from './result';

/** Turns a zod failure into the one-line error the UI shows beside the field. */
export function zodIssueToError(error: z.ZodError): ApiError {
  const issue = error.issues[0];
  if (!issue) return { code: 'invalid_input', message: 'invalid input' };
  const field = issue.path.map(String).join('.');
  const message = field ? `${field}: ${issue.message}` : issue.message;
  return field ? { code: 'invalid_input', message, field } : { code: 'invalid_input', message };
}

export function validateInput<Name extends OperationName>(
  name: Name,
  raw: unknown,
): { ok: true; value: ValidatedInput<Name> } | { ok: false; error: ApiError } {
  const parsed = operations[name].input.safeParse(raw ?? {});
  if (parsed.success) return { ok: true, value: parsed.data as ValidatedInput<Name> };
  return { ok: false, error: zodIssueToError(parsed.error) };
}
