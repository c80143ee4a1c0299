import { describe, expect, it } from 'vitest';
import { simulationStartSchema } from '../../../shared-model/api/simulation';
import { INITIAL_RUN_FORM, modeText, readRunForm } from '../../../renderer/src/views/simulation/run-form';

describe('run form: relaxation and stopping', () => {
  it('says which mode the pair runs in by default, and why', () => {
    expect(modeText({ ...INITIAL_RUN_FORM, elementA: 'Au', elementB: 'Ni' })).toMatch(
      /^Relaxed: nearest-neighbour distances differ by 14\.\d %/,
    );
    expect(modeText(INITIAL_RUN_FORM)).toMatch(/^Rigid lattice: .*at most 6 %/);
    expect(modeText({ ...INITIAL_RUN_FORM, relaxation: 'relaxed' })).toBe('Relaxed: chosen.');
  });

  it('a chosen mode and "run every sweep" reach the contract as relaxation and stopping: null', () => {
    const reading = readRunForm({ ...INITIAL_RUN_FORM, relaxation: 'rigid', stopAtAnswer: false });
    expect(reading.ok && reading.input).toMatchObject({ relaxation: 'rigid', stopping: null });
    if (!reading.ok) throw new Error(reading.message);
    expect(simulationStartSchema.safeParse(reading.input).success).toBe(true);
  });
});
