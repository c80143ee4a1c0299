/** `pairwright batches status <id> <status>`: move a batch along, with measured seed values. */
import type { BatchStatus, StatusChange } from '../../../../shared-model/api/batches';
import { CliError, optionalNumber, requirePositional, type CliCommand } from '../../command';

export const batchesStatusCommand: CliCommand = {
  words: ['batches', 'status'],
  args: '<batch id> <planned|made|characterized>',
  summary: 'Move a batch along; --diameter and --conc record measured seed values',
  options: {
    diameter: { type: 'string', description: 'measured mean diameter, nm' },
    conc: { type: 'string', description: 'measured concentration, particles/mL' },
  },
  run: async (args, context) => {
    const idText = requirePositional(args, 0, 'batch id');
    if (!/^\d+$/.test(idText)) throw new CliError(`<batch id> must be a whole number, got "${idText}"`);
    const diameter = optionalNumber(args, 'diameter');
    const conc = optionalNumber(args, 'conc');
    const batch = await context.call('batches.setStatus', {
      id: Number(idText),
      status: requirePositional(args, 1, 'status') as BatchStatus,
      ...(diameter !== undefined || conc !== undefined
        ? {
            measured: {
              ...(diameter !== undefined ? { diameterNm: diameter } : {}),
              ...(conc !== undefined ? { particlesPerMl: conc } : {}),
            },
          }
        : {}),
    });
    return { json: batch, text: statusText(batch) };
  },
};

/** The new status, then what it did to the inventory: taken or given back, warnings, unmatched reagents. */
function statusText(change: StatusChange): string {
  const lines = [`batch ${change.id} "${change.name}" is ${change.status}`];
  const effect = change.inventoryEffect;
  if (!effect) return lines.join('\n');
  const shown = (value: number) => String(Number(value.toPrecision(4)));
  lines.push(effect.kind === 'used' ? 'taken from the inventory:' : 'given back to the inventory:');
  if (effect.movements.length === 0) lines.push('  nothing');
  for (const m of effect.movements) {
    const sign = m.delta < 0 ? '-' : '+';
    lines.push(`  ${m.reagentName}: ${sign}${shown(Math.abs(m.delta))} ${m.unit} (now ${shown(m.after)} ${m.unit})`);
  }
  for (const warning of effect.warnings) lines.push(`warning: ${warning}`);
  for (const u of effect.unmatched) lines.push(`not matched: ${u.reagentName}: ${u.reason}`);
  return lines.join('\n');
}
