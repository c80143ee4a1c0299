/**
 * The simulation form's model without a browser: typed text → `simulation.start` input (decimal commas,
 * the field at fault named), the plan line, and taking over a request from a pair's detail.
 */
import { describe, expect, it } from 'vitest';
import { validateInput } from '../../../shared-model/api/validate';
import {
  describeRequest,
  formFromRequest,
  INITIAL_RUN_FORM,
  planText,
  readRunForm,
  shellsHint,
} from '../../../renderer/src/views/simulation/run-form';

describe('simulation run form', () => {
  it('reads the defaults into an input the contract accepts', () => {
    const reading = readRunForm(INITIAL_RUN_FORM);
    expect(reading).toEqual({
      ok: true,
      input: {
        elementA: 'Ag',
        elementB: 'Pd',
        xB: 0.5,
        shape: 'cuboctahedron',
        shells: 5,
        temperatureK: 600,
        sweeps: 1000,
        anneal: null,
        seed: 1,
      },
    });
  });

  it('reads decimal commas, the diameter instead of shells, an annealing schedule, and an empty seed as 1', () => {
    const form = {
      ...INITIAL_RUN_FORM,
      xB: '0,25',
      sizeMode: 'diameter' as const,
      diameterNm: '2,5',
      anneal: true,
      annealStartK: '1200,5',
      seed: ' ',
    };
    const reading = readRunForm(form);
    if (!reading.ok) throw new Error(reading.message);
    expect(reading.input).toMatchObject({
      xB: 0.25,
      diameterNm: 2.5,
      anneal: { startTemperatureK: 1200.5, sweeps: 500 },
      seed: 1,
    });
    expect(reading.input).not.toHaveProperty('shells');
  });

  it('names the field that does not hold a number, by its API path', () => {
    expect(readRunForm({ ...INITIAL_RUN_FORM, temperatureK: 'hot' })).toEqual({
      ok: false,
      field: 'temperatureK',
      message: 'temperature, K: "hot" is not a number',
    });
    expect(readRunForm({ ...INITIAL_RUN_FORM, xB: '' })).toEqual({
      ok: false,
      field: 'xB',
      message: 'x(Pd): enter a number',
    });
    expect(readRunForm({ ...INITIAL_RUN_FORM, sweeps: '1,000.5' })).toMatchObject({
      ok: false,
      field: 'sweeps',
      message: /more than one/,
    });
    expect(readRunForm({ ...INITIAL_RUN_FORM, anneal: true, annealSweeps: 'x' })).toMatchObject({
      ok: false,
      field: 'anneal.sweeps',
    });
  });

  it('leaves range checks to the contract, which names the field', () => {
    const reading = readRunForm({ ...INITIAL_RUN_FORM, temperatureK: '0' });
    if (!reading.ok) throw new Error(reading.message);
    const parsed = validateInput('simulation.start', reading.input);
    expect(parsed).toMatchObject({
      ok: false,
      error: { field: 'temperatureK', message: expect.stringMatching(/above 0 K/) },
    });
  });

  it('plans the run while typing: (10n³ + 15n² + 11n + 3)/3 atoms in an n-shell cuboctahedron (Mackay 1962)', () => {
    expect(planText(INITIAL_RUN_FORM)).toEqual({ ok: true, text: '561 atoms, 1,000 sweeps = 5.61e+5 swap attempts' });
    expect(planText({ ...INITIAL_RUN_FORM, shells: '4' }).text).toMatch(/^309 atoms/);
    expect(planText({ ...INITIAL_RUN_FORM, shells: '40' })).toMatchObject({
      ok: false,
      text: expect.stringMatching(/limit is 50000 atoms/),
    });
    expect(planText({ ...INITIAL_RUN_FORM, shells: 'five' })).toEqual({
      ok: false,
      text: 'shells: "five" is not a number',
    });
  });

  it('takes a request from a pair detail: pair, composition, diameter and temperature; keeps sweeps and seed', () => {
    const request = {
      elementA: 'Pt',
      elementB: 'Ni',
      xB: 0.30000000000000004,
      diameterNm: 2.5,
      shape: 'truncated-octahedron' as const,
      temperatureK: 700,
      source: 'the pair detail of Pt-Ni',
    };
    const form = formFromRequest({ ...INITIAL_RUN_FORM, sweeps: '250', seed: '9' }, request);
    expect(form).toMatchObject({
      elementA: 'Pt',
      elementB: 'Ni',
      xB: '0.3',
      shape: 'truncated-octahedron',
      sizeMode: 'diameter',
    });
    expect(form).toMatchObject({ diameterNm: '2.5', temperatureK: '700', sweeps: '250', seed: '9' });
    expect(describeRequest(request)).toMatch(
      /^Filled in from the pair detail of Pt-Ni: Pt-Ni, x\(Ni\) = 0\.3, 2\.5 nm/,
    );
  });

  it('hints what a shell means for each shape', () => {
    expect(shellsHint('truncated-octahedron')).toBe('edge atoms − 1');
    expect(shellsHint('sphere')).toMatch(/radius/);
    expect(shellsHint('icosahedron')).toMatch(/309/);
  });
});
