/** The one shape list: words for the screen, the older spelling read, and both contracts taking the same names. */
import { describe, expect, it } from 'vitest';
import { conditionsSchema } from '../../../shared-model/api/prediction';
import { simulationSpecSchema } from '../../../shared-model/api/simulation';
import { normaliseShapeName, PARTICLE_SHAPES, shapeLabel } from '../../../shared-model/geometry/shapes';

describe('particle shapes', () => {
  it('shows each shape in words', () => {
    expect(PARTICLE_SHAPES.map(shapeLabel)).toEqual(['cuboctahedron', 'icosahedron', 'truncated octahedron', 'sphere']);
  });

  it('reads the older spelling and forgives case and spacing', () => {
    expect(normaliseShapeName('truncated octahedron')).toBe('truncated-octahedron');
    expect(normaliseShapeName(' Truncated_Octahedron ')).toBe('truncated-octahedron');
    expect(normaliseShapeName('Sphere')).toBe('sphere');
  });

  it('prediction and simulation contracts accept the same names and refuse others alike', () => {
    const conditions = { xB: 0.5, diameterNm: 3, temperatureK: 600 };
    const spec = { elementA: 'Ag', elementB: 'Pd', xB: 0.5, shells: 3, temperatureK: 600, sweeps: 10 };
    for (const shape of [...PARTICLE_SHAPES, 'truncated octahedron']) {
      const expected = normaliseShapeName(shape);
      expect(conditionsSchema.parse({ ...conditions, shape }).shape).toBe(expected);
      expect(simulationSpecSchema.parse({ ...spec, shape }).shape).toBe(expected);
    }
    const refusals = [
      conditionsSchema.safeParse({ ...conditions, shape: 'cube' }),
      simulationSpecSchema.safeParse({ ...spec, shape: 'cube' }),
    ];
    for (const refusal of refusals) {
      expect(refusal.error?.issues[0]).toMatchObject({
        path: ['shape'],
        message: `must be one of: ${PARTICLE_SHAPES.join(', ')}`,
      });
    }
  });
});
