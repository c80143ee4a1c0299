/**
 * Input generators for the fuzz suite (fast-check): arbitrary JSON, objects with the operation's own keys holding
 * arbitrary values, and near-valid mutations of a valid input (one to three edits: a value replaced by arbitrary
 * JSON or an edge value, a key removed or added, a number scaled, negated or made extreme, a string emptied,
 * lengthened, given a NUL or changed in case). Edge values are the usual boundary cases of property-based testing
 * (from memory): zero and negative zero, the smallest denormal, the largest double, 2^53, NaN and infinities
 * (reachable over IPC, not JSON), empty and very long text, control characters, wrong types.
 */
import fc from 'fast-check';

export const EDGE_VALUES: unknown[] = [
  0,
  -0,
  -1,
  1,
  0.5,
  1e-9,
  5e-324,
  1e308,
  -1e308,
  2 ** 53,
  2 ** 31,
  1.5,
  Number.NaN,
  Number.POSITIVE_INFINITY,
  Number.NEGATIVE_INFINITY,
  '',
  ' ',
  '\u0000',
  'a\u0000b',
  'NaN',
  '1e999',
  '1,5',
  'x'.repeat(5000),
  '𝔘ñí©ødé',
  'Pt-Pt',
  'Xx-Yy',
  'Au@Pd',
  'alloy',
  '../../../etc/passwd',
  '2026-02-30',
  "'; DROP TABLE campaigns; --",
  null,
  true,
  false,
  [],
  {},
  [null],
  { a: 1 },
  [1, 2, 3],
];

const edge = fc.constantFrom(...EDGE_VALUES);
const json = fc.jsonValue({ maxDepth: 3 });
const replacement = fc.oneof({ arbitrary: edge, weight: 3 }, { arbitrary: json, weight: 2 });

type Path = (string | number)[];

function pathsOf(value: unknown, prefix: Path = [], out: Path[] = []): Path[] {
  out.push(prefix);
  if (prefix.length > 6) return out;
  if (Array.isArray(value)) value.slice(0, 20).forEach((v, i) => pathsOf(v, [...prefix, i], out));
  else if (typeof value === 'object' && value !== null)
    for (const [k, v] of Object.entries(value)) pathsOf(v, [...prefix, k], out);
  return out;
}

function clone(value: unknown): unknown {
  if (Array.isArray(value)) return value.map(clone);
  if (typeof value === 'object' && value !== null)
    return Object.fromEntries(Object.entries(value).map(([k, v]) => [k, clone(v)]));
  return value;
}

interface Edit {
  pick: number;
  kind: 'replace' | 'delete' | 'add' | 'number' | 'string';
  value: unknown;
  key: string;
  scale: number;
}

const editArb: fc.Arbitrary<Edit> = fc.record({
  pick: fc.nat(),
  kind: fc.constantFrom('replace', 'replace', 'delete', 'add', 'number', 'number', 'string'),
  value: replacement,
  key: fc.oneof(fc.string({ maxLength: 12 }), fc.constantFrom('__proto__', 'constructor', 'id', 'confirm')),
  scale: fc.integer({ min: 0, max: 15 }),
});

const NUMBER_EDITS: ((n: number) => number)[] = [
  (n) => -n,
  (n) => n * 1e6,
  (n) => n * 1e-6,
  (n) => n + 0.5,
  (n) => n - 1,
  (n) => n * 1e300,
  (n) => n + 1e-12,
  () => 0,
  () => Number.MAX_SAFE_INTEGER,
  () => 5e-324,
  (n) => Math.round(n * 1000) + 0.001,
  (n) => n * 2,
  (n) => n / 3,
  () => -1e-300,
  () => Number.NaN,
  () => 1e21,
];
const STRING_EDITS: ((s: string) => string)[] = [
  () => '',
  (s) => `${s}\u0000`,
  (s) => s.repeat(200),
  (s) => s.toUpperCase(),
  (s) => s.toLowerCase(),
  (s) => `  ${s}  `,
  (s) => s.slice(0, Math.floor(s.length / 2)),
  (s) => s.replace(/\n/g, '\r\n'),
  (s) => s.replace(/,/g, ';'),
  (s) => s.replace(/\./g, ','),
  (s) => s.replace(/\d/, 'x'),
  (s) => `${s}\n${s}`,
  (s) => s.split('\n').reverse().join('\n'),
  (s) => `\uFEFF${s}`,
  (s) => s.replace(/\d+/g, (d) => `${d}${d}${d}`),
  (s) => s.replace(/\n[^\n]*$/, '\n1,2,3,4,5,6,7,8,9'),
];

function applyEdit(root: unknown, edit: Edit): unknown {
  const paths = pathsOf(root);
  const path = paths[edit.pick % paths.length]!;
  if (path.length === 0) {
    if (edit.kind === 'replace') return clone(edit.value);
    if (edit.kind === 'add' && typeof root === 'object' && root !== null && !Array.isArray(root))
      return { ...root, [edit.key]: clone(edit.value) };
    return root;
  }
  const parentPath = path.slice(0, -1);
  let parent: unknown = root;
  for (const step of parentPath) parent = (parent as Record<string | number, unknown>)[step];
  const container = parent as Record<string | number, unknown>;
  const last = path[path.length - 1]!;
  const current = container[last];
  switch (edit.kind) {
    case 'replace':
      container[last] = clone(edit.value);
      break;
    case 'delete':
      if (Array.isArray(container)) container.splice(last as number, 1);
      else delete container[last];
      break;
    case 'add':
      if (Array.isArray(current)) current.push(clone(edit.value));
      else if (typeof current === 'object' && current !== null)
        (current as Record<string, unknown>)[edit.key] = clone(edit.value);
      else container[last] = clone(edit.value);
      break;
    case 'number':
      if (typeof current === 'number') container[last] = NUMBER_EDITS[edit.scale % NUMBER_EDITS.length]!(current);
      else container[last] = clone(edit.value);
      break;
    case 'string':
      if (typeof current === 'string') container[last] = STRING_EDITS[edit.scale % STRING_EDITS.length]!(current);
      else container[last] = clone(edit.value);
      break;
  }
  return root;
}

/** One to three edits of one of the valid inputs. */
export function nearValid(seeds: unknown[]): fc.Arbitrary<unknown> {
  return fc
    .tuple(fc.nat({ max: seeds.length - 1 }), fc.array(editArb, { minLength: 1, maxLength: 3 }))
    .map(([index, edits]) => edits.reduce((value, edit) => applyEdit(value, edit), clone(seeds[index])));
}

/** Objects built from the operation's own keys (and a few others) holding arbitrary values. */
function ownKeys(seeds: unknown[]): fc.Arbitrary<unknown> {
  const keys = [
    ...new Set(seeds.flatMap((s) => (typeof s === 'object' && s !== null ? Object.keys(s) : []))),
    'id',
    'extra',
  ];
  return fc.dictionary(fc.constantFrom(...keys), replacement, { maxKeys: keys.length });
}

/**
 * The input mix of one operation: near-valid mutations (60 %), the valid inputs themselves (10 %), the operation's
 * keys with arbitrary values (15 %), arbitrary JSON (15 %).
 */
export function inputsFor(seeds: unknown[]): fc.Arbitrary<unknown> {
  return fc.oneof(
    { arbitrary: nearValid(seeds), weight: 12 },
    { arbitrary: fc.constantFrom(...seeds).map(clone), weight: 2 },
    { arbitrary: ownKeys(seeds), weight: 3 },
    { arbitrary: fc.jsonValue({ maxDepth: 4 }), weight: 3 },
  );
}
