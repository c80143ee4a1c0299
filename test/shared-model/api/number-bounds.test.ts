/**
 * Every number any operation takes has a finite physical range in its zod schema, with the range in the message
 * (issue 14: a probe σ of 1e-6 nm or a 100 Å cut-off were once accepted and froze the host). The test walks every
 * operation's input schema through zod's own introspection, so a new unbounded number field fails it.
 */
import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { operations, type OperationName } from '../../../shared-model/api/contract';
import { validateInput } from '../../../shared-model/api/validate';

interface NumberField {
  path: string;
  schema: z.ZodNumber;
}

/** Every z.number() inside a schema, with its path; a schema kind the walk does not know is an error. */
function numberFields(schema: z.ZodType, path: string, out: NumberField[] = [], stack = new Set<unknown>()) {
  if (stack.has(schema)) return out;
  stack.add(schema);
  const def = schema._zod.def as unknown as Record<string, unknown> & { type: string };
  const walk = (inner: unknown, at: string) => numberFields(inner as z.ZodType, at, out, stack);
  switch (def.type) {
    case 'number':
      out.push({ path, schema: schema as z.ZodNumber });
      break;
    case 'object':
      for (const [key, value] of Object.entries(def.shape as Record<string, unknown>)) walk(value, `${path}.${key}`);
      if (def.catchall) walk(def.catchall, `${path}.*`);
      break;
    case 'array':
      walk(def.element, `${path}[]`);
      break;
    case 'optional':
    case 'nullable':
    case 'default':
    case 'prefault':
    case 'readonly':
    case 'catch':
    case 'nonoptional':
      walk(def.innerType, path);
      break;
    case 'pipe':
      walk(def.in, path);
      walk(def.out, path);
      break;
    case 'union':
      for (const option of def.options as unknown[]) walk(option, path);
      break;
    case 'intersection':
      walk(def.left, path);
      walk(def.right, path);
      break;
    case 'record':
      walk(def.keyType, `${path}{key}`);
      walk(def.valueType, `${path}{}`);
      break;
    case 'tuple':
      (def.items as unknown[]).forEach((item, index) => walk(item, `${path}[${index}]`));
      if (def.rest) walk(def.rest, `${path}[…]`);
      break;
    case 'lazy':
      walk((def.getter as () => unknown)(), path);
      break;
    case 'string':
    case 'boolean':
    case 'literal':
    case 'enum':
    case 'transform':
    case 'null':
    case 'undefined':
    case 'never':
      break;
    default:
      throw new Error(`${path}: the bounds walk does not know zod schemas of type "${def.type}"; teach it`);
  }
  stack.delete(schema);
  return out;
}

function allNumberFields(): NumberField[] {
  return Object.entries(operations).flatMap(([name, spec]) => numberFields(spec.input, name));
}

/** A zod default message ("Too big: expected number to be <=500") names no quantity: every bound gives its own. */
const ZOD_DEFAULT_MESSAGE = /^(Too (big|small)|Invalid input|Expected)/;
/** Our own words with the bound: a figure ("at most 50 nm") or, for a bound at 0 exclusive, "positive". */
const statesRange = (message: string) => !ZOD_DEFAULT_MESSAGE.test(message) && /\d|positive/.test(message);

function problems(field: NumberField): string[] {
  const { schema, path } = field;
  const found: string[] = [];
  const min = schema.minValue;
  const max = schema.maxValue;
  if (min === null || !Number.isFinite(min)) found.push(`${path}: no finite minimum`);
  if (max === null || !Number.isFinite(max)) found.push(`${path}: no finite maximum`);
  for (const odd of [Number.NaN, Number.POSITIVE_INFINITY, Number.NEGATIVE_INFINITY]) {
    if (schema.safeParse(odd).success) found.push(`${path}: accepts ${odd}`);
  }
  const integer = schema.isInt;
  const outside = (bound: number, direction: 1 | -1) => {
    const step = Math.max(1, Math.abs(bound));
    const value = bound + direction * step;
    return integer ? Math.round(value) : value;
  };
  for (const [bound, direction] of [
    [min, -1],
    [max, 1],
  ] as const) {
    if (bound === null || !Number.isFinite(bound)) continue;
    const result = schema.safeParse(outside(bound, direction));
    if (result.success) found.push(`${path}: accepts ${outside(bound, direction)} beyond its bound ${bound}`);
    else {
      const messages = result.error.issues.map((issue) => issue.message);
      if (!messages.some(statesRange))
        found.push(`${path}: the message "${messages.join('; ')}" does not state the range`);
    }
  }
  return found;
}

describe('number bounds of every operation input', () => {
  it('finds the number fields of every area (the walk reaches them)', () => {
    const paths = new Set(allNumberFields().map((field) => field.path));
    // A few known fields of each area, so a walk that stops early fails here rather than passing empty.
    for (const known of [
      'outcomes.refitLineScan.probeSigmaNm',
      'outcomes.record.composition.measurements[].xB',
      'simulation.energy.cutoffAngstrom',
      'simulation.start.anneal.startTemperatureK',
      'prediction.rank.conditions.thresholds.intermetallicUnlikeRatio',
      'batches.design.size.diameterNm',
      'batches.save.design.latticeNm{}',
      'learn.propose.seed',
      'screen.start.diameterNm[]',
      'reagents.add.densityGPerMl',
      'backups.setKeep.keep',
    ]) {
      expect(paths, known).toContain(known);
    }
    expect(paths.size).toBeGreaterThan(150);
  });

  it('bounds every number field to a finite range, refuses NaN and ±Infinity, and states the range', () => {
    const found = allNumberFields().flatMap(problems);
    expect(found).toEqual([]);
  });

  it('would catch an unbounded field (the check can fail)', () => {
    const fixture = z.object({
      a: z.number().min(0, 'must be at least 0'),
      b: z.array(z.number().gt(0, 'must be positive').max(1, 'at most one')).optional(),
      c: z.number().int().min(1).max(5),
    });
    const found = numberFields(fixture, 'fixture').flatMap(problems);
    expect(found).toEqual([
      'fixture.a: no finite maximum',
      'fixture.b[]: the message "at most one" does not state the range',
      'fixture.c: the message "Too small: expected number to be >=1" does not state the range',
      'fixture.c: the message "Too big: expected number to be <=5" does not state the range',
    ]);
    expect(() => numberFields(z.object({ d: z.any() }), 'fixture')).toThrow(/type "any"; teach it/);
  });

  it('names the field and the range when an operation refuses a number', () => {
    const cases: [OperationName, unknown, string, RegExp][] = [
      [
        'simulation.start',
        {
          elementA: 'Ag',
          elementB: 'Pd',
          xB: 0.5,
          shape: 'cuboctahedron',
          shells: 2,
          temperatureK: 600,
          sweeps: 10,
          seed: 2 ** 40,
        },
        'seed',
        /^The seed must be a seed from 0 to 4294967295$/,
      ],
      [
        'batches.design',
        {
          elementA: 'Au',
          elementB: 'Pd',
          target: 'alloy',
          route: 'co-reduction',
          size: { kind: 'alloy', diameterNm: 5, xB: 0.5 },
          amount: { kind: 'total-metal', totalMetalMmol: 0.1 },
          batchVolumeMl: 1e9,
          precursors: [{ element: 'Au', reagentKey: 'haucl4-3h2o' }],
        },
        'batchVolumeMl',
        /^batch volume must be at most 100000 mL$/,
      ],
      [
        'prediction.predict',
        { pair: 'Au-Pd', conditions: { xB: 0.5, diameterNm: 5, temperatureK: 600, pressureBar: 1e-300 } },
        'conditions.pressureBar',
        /^The pressure \(bar\) must be at least 1e-15 bar$/,
      ],
    ];
    for (const [name, input, field, message] of cases) {
      const result = validateInput(name, input);
      expect(result, name).toMatchObject({ ok: false, error: { code: 'invalid_input', field } });
      if (!result.ok) expect(result.error.message).toMatch(message);
    }
  });
});
