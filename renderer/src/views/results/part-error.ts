/**
 * Each Results panel stores its own part of a batch outcome through `outcomes.record`, which names the part
 * in the error ("sizes: line 3: …", field "sizes.csvText"); the panel's inputs are named without the part and
 * its heading already names it. This gives the error as the panel shows it: the field relative to the part
 * (so the message appears beside the input) and the message without the part's name in front.
 */
import { OUTCOME_PART_NAMES, type OutcomePart } from '../../../../shared-model/api/outcomes';
import type { ApiError } from '../../../../shared-model/api/result';

export function partError(error: ApiError, part: OutcomePart): ApiError {
  const fieldPrefix = `${part}.`;
  const messagePrefixes = [`${OUTCOME_PART_NAMES[part]}: `, fieldPrefix];
  const namedPrefix = messagePrefixes.find((prefix) => error.message.startsWith(prefix));
  const message = namedPrefix ? error.message.slice(namedPrefix.length) : error.message;
  if (error.field === part || error.field === undefined) return { code: error.code, message };
  if (!error.field.startsWith(fieldPrefix)) return { ...error, message };
  return { code: error.code, message, field: error.field.slice(fieldPrefix.length) };
}
