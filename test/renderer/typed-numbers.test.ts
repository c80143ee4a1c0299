/** Form number fields read through the one reader; the first refusal names the input it belongs to. */
import { describe, expect, it } from 'vitest';
import { fieldNumber, optionalFieldNumber, readForm } from '../../renderer/src/forms/typed-numbers';
import { emptyRow, readCompositionForm } from '../../renderer/src/views/results/composition-form';

describe('typed numbers in forms', () => {
  it('reads values, empty optional fields as null, and reports the first refusal with its input', () => {
    expect(readForm(() => [fieldNumber('2,5', 'a', 'A'), optionalFieldNumber(' ', 'b', 'B')])).toEqual({
      ok: true,
      value: [2.5, null],
    });
    expect(readForm(() => [fieldNumber('x', 'a', 'diameter, nm'), fieldNumber('y', 'b', 'B')])).toEqual({
      ok: false,
      error: { code: 'invalid_input', field: 'a', message: 'diameter, nm: "x" is not a number' },
    });
  });

  it('lets errors that are not refusals through', () => {
    expect(() =>
      readForm(() => {
        throw new TypeError('a bug');
      }),
    ).toThrow(TypeError);
  });
});

describe('composition form', () => {
  const rows = [
    { ...emptyRow('ICP-OES'), xBPct: '24,5', uncertaintyPct: '0,5' },
    emptyRow('EDX particle'),
    { ...emptyRow('EDX area'), xBPct: '26', lines: ' Pt L, Ni K ' },
  ];

  it('turns typed at.% into fractions and leaves empty rows out', () => {
    const reading = readCompositionForm('25', ' Cu ', rows);
    expect(reading).toEqual({
      ok: true,
      value: {
        nominalXB: 0.25,
        gridMetal: 'Cu',
        measurements: [
          { method: 'ICP-OES', xB: 0.245, uncertaintyXB: 0.005 },
          { method: 'EDX area', xB: 0.26, uncertaintyXB: null, lines: 'Pt L, Ni K' },
        ],
      },
    });
    expect(readCompositionForm('', '', [])).toEqual({
      ok: true,
      value: { nominalXB: null, gridMetal: null, measurements: [] },
    });
  });

  it('names the row as shown on screen when its value is not a number', () => {
    const bad = [...rows.slice(0, 2), { ...emptyRow('EDX area'), xBPct: '26', uncertaintyPct: '1 000' }];
    expect(readCompositionForm('25', '', bad)).toMatchObject({
      ok: false,
      error: { field: 'measurements.2.uncertaintyXB', message: /^EDX area ± at\.%: .*thousands separators/ },
    });
    expect(readCompositionForm('25 %', '', rows)).toMatchObject({ ok: false, error: { field: 'nominalXB' } });
  });
});
