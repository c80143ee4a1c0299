/**
 * What recording an outcome moved, in words for the Results view: `outcomes.record` answers with the
 * status changes it made in the same transaction (the batch, and its campaign pair, to characterized).
 */
import type { RecordedOutcome } from '../../../../shared-model/api/outcomes';

/** One sentence naming each move, or null when the record moved nothing. */
export function statusChangeText(
  changes: RecordedOutcome['statusChanges'],
  batchName: string,
  pairName: string,
): string | null {
  const moves: string[] = [];
  if (changes.batch) moves.push(`batch "${batchName}" moved from ${changes.batch.from} to ${changes.batch.to}`);
  if (changes.pair) moves.push(`the campaign pair ${pairName} moved from ${changes.pair.from} to ${changes.pair.to}`);
  if (moves.length === 0) return null;
  const text = moves.join('; ');
  return `Recorded: ${text}. You can still set statuses by hand (Batch design, Campaigns).`;
}
