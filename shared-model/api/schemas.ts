/** zod building blocks shared by the API areas: ids, names, element symbols, pair strings. */
import { z } from 'zod';
import { isMetalSymbol, METAL_SYMBOLS } from '../elements/symbols';
import { normaliseShapeName, PARTICLE_SHAPES } from '../geometry/shapes';

export const idSchema = z
  .number({ error: 'must be a number' })
  .int('must be a whole number')
  .positive('must be a positive id')
  .max(Number.MAX_SAFE_INTEGER, `must be a stored id (at most ${Number.MAX_SAFE_INTEGER})`);

/**
 * A seed of the seeded generator (shared-model/random.ts reads it as an unsigned 32-bit integer): 0 to 2^32 − 1,
 * so two different seeds never give the same stream.
 */
export const seedSchema = z
  .number({ error: 'must be a whole number' })
  .int('must be a whole number')
  .min(0, 'must be a seed from 0 to 4294967295')
  .max(0xffff_ffff, 'must be a seed from 0 to 4294967295');

/** True when text holds a NUL or another control character that no name or note should carry (tab and newline pass). */
export function hasControlCharacters(text: string): boolean {
  // eslint-disable-next-line no-control-regex
  return /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f]/.test(text);
}

export const nameSchema = z
  .string({ error: 'must be text' })
  .trim()
  .min(1, 'must not be empty')
  .max(120, 'must be at most 120 characters')
  .refine((text) => !hasControlCharacters(text), 'must not contain control characters such as NUL');

export const elementSymbolSchema = z
  .string({ error: 'must be an element symbol' })
  .trim()
  .refine(isMetalSymbol, {
    error: (issue) => `unknown element "${String(issue.input)}"; known metals: ${METAL_SYMBOLS.join(' ')}`,
  });

const shapeError = `must be one of: ${PARTICLE_SHAPES.join(', ')}`;

/** A particle shape of the one list; "truncated octahedron" (the older spelling) is read as truncated-octahedron. */
export const particleShapeSchema = z
  .string({ error: shapeError })
  .transform(normaliseShapeName)
  .pipe(z.enum(PARTICLE_SHAPES, { error: shapeError }));

/** "Pt-Ni", "Pt–Ni" or "PtNi" → ["Pt","Ni"]. */
export function splitPair(text: string): [string, string] | null {
  const trimmed = text.trim();
  const dashed = /^([A-Za-z]{1,2})\s*[-–—/]\s*([A-Za-z]{1,2})$/.exec(trimmed);
  const joined = /^([A-Z][a-z]?)([A-Z][a-z]?)$/.exec(trimmed);
  const match = dashed ?? joined;
  if (!match) return null;
  const norm = (s: string) => s.charAt(0).toUpperCase() + s.slice(1).toLowerCase();
  return [norm(match[1] as string), norm(match[2] as string)];
}

export const pairTextSchema = z.string({ error: 'must be a pair like "Pt-Ni"' }).transform((text, ctx) => {
  const parts = splitPair(text);
  if (!parts) {
    ctx.addIssue({ code: 'custom', message: `"${text}" is not a pair; write it as A-B, e.g. Pt-Ni` });
    return z.NEVER;
  }
  const [a, b] = parts;
  // an unknown element is the fault of that element (field pair.elementA / pair.elementB), not of the pair
  for (const [index, symbol] of parts.entries()) {
    if (!isMetalSymbol(symbol)) {
      const which = index === 0 ? 'first' : 'second';
      ctx.addIssue({
        code: 'custom',
        path: [index === 0 ? 'elementA' : 'elementB'],
        message: `The ${which} element of "${text}" is not one of Pairwright's metals: unknown element "${symbol}"; known metals: ${METAL_SYMBOLS.join(' ')}`,
      });
      return z.NEVER;
    }
  }
  if (a === b) {
    ctx.addIssue({ code: 'custom', message: `a pair needs two different elements, got ${a}-${b}` });
    return z.NEVER;
  }
  return { elementA: a, elementB: b };
});
