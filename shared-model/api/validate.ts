import type { z } from 'zod';
import { operations, type OperationName, type ValidatedInput } from './contract';
import { fieldWords, operationSubject, userMessage } from './issue-message';
import type { ApiError } from './result';

/**
 * Turns a zod failure into the one sentence the UI shows beside the field (`field`: the dotted input path)
 * and the CLI prints: the field in words, never the code path ("Give the campaign a name", not
 * "name: must not be empty"). `operation` names what the input is about, for "Give the … a name".
 */
export function zodIssueToError(error: z.ZodError, operation?: string): ApiError {
  const issue = error.issues[0];
  if (!issue) return { code: 'invalid_input', message: 'The input was refused' };
  const field = issue.path.map(String).join('.');
  const message = userMessage(fieldWords(issue.path), issue.message, operationSubject(operation));
  return field ? { code: 'invalid_input', message, field } : { code: 'invalid_input', message };
}

export function validateInput<Name extends OperationName>(
  name: Name,
  raw: unknown,
): { ok: true; value: ValidatedInput<Name> } | { ok: false; error: ApiError } {
  const parsed = operations[name].input.safeParse(raw ?? {});
  if (parsed.success) return { ok: true, value: parsed.data as ValidatedInput<Name> };
  return { ok: false, error: zodIssueToError(parsed.error, name) };
}
