/**
 * Chemical formulas → molar masses (DOMAIN.md Models 6), through mf-parser.
 *
 * Hydrates: chemists write "HAuCl4·3H2O", "HAuCl4•3H2O", "HAuCl4*3H2O" or "HAuCl4.3H2O". mf-parser
 * separates parts only with a dot that is NOT glued to a preceding count: it reads "HAuCl4.3H2O" as
 * Cl₄.₃ (a decimal count) and gives 368.44 g/mol instead of 393.83. So every hydrate separator is
 * rewritten to " . " before parsing, which mf-parser reads as "plus n formula units of water".
 * Consequence: decimal (non-stoichiometric) counts are not supported in formulas; state a variable
 * water content through the reagent's metal content instead.
 *
 * Atomic masses are mf-parser's (isotope-abundance weighted, e.g. H 1.00794, Cl 35.4529), which agree
 * with the IUPAC standard atomic weights to better than 0.001 g/mol for the elements used here.
 */
import { MF } from 'mf-parser';
import { invalid } from '../api/result';

export interface ParsedFormula {
  /** The formula as typed (trimmed). */
  formula: string;
  /** The form handed to mf-parser (hydrate separators normalised to " . "). */
  normalized: string;
  molarMassGPerMol: number;
  /** Atom counts of the whole formula unit, water of hydration included. */
  atoms: Record<string, number>;
}

const HYDRATE_SEPARATOR = /\s*[·•∙*.]\s*/g;

/** Rewrites every hydrate/adduct separator (· • ∙ * .) to " . ", the form mf-parser reads as a separate part. */
export function normalizeFormula(formula: string): string {
  return formula.trim().replace(HYDRATE_SEPARATOR, ' . ');
}

/**
 * Parses a formula; throws `invalid(field, …)` naming the field when it is empty, unparseable, has an
 * unknown element, or a count that is not a positive whole number.
 */
export function parseFormula(formula: string, field = 'formula'): ParsedFormula {
  const trimmed = typeof formula === 'string' ? formula.trim() : '';
  if (trimmed.length === 0) throw invalid(field, `${field} must not be empty`);
  const normalized = normalizeFormula(trimmed);
  let info: { mass: number; atoms: Record<string, number> };
  try {
    const parsed = new MF(normalized).getInfo() as { mass?: number; atoms?: Record<string, number> };
    info = { mass: Number(parsed.mass), atoms: parsed.atoms ?? {} };
  } catch (error) {
    const reason = error instanceof Error ? error.message.split('\n')[0] : String(error);
    throw invalid(field, `${field} "${trimmed}" is not a chemical formula mf-parser can read (${reason})`);
  }
  const counts = Object.entries(info.atoms);
  if (counts.length === 0 || !Number.isFinite(info.mass) || info.mass <= 0) {
    throw invalid(field, `${field} "${trimmed}" has no atoms`);
  }
  for (const [element, count] of counts) {
    if (!Number.isInteger(count) || count <= 0) {
      throw invalid(field, `${field} "${trimmed}" gives ${count} ${element} atoms; counts must be whole numbers`);
    }
  }
  return { formula: trimmed, normalized, molarMassGPerMol: info.mass, atoms: { ...info.atoms } };
}

export function molarMassGPerMol(formula: string, field = 'formula'): number {
  return parseFormula(formula, field).molarMassGPerMol;
}

/** Standard atomic weight of one element (g/mol), via the same table. */
export function atomicMassGPerMol(symbol: string): number {
  if (!/^[A-Z][a-z]?$/.test(symbol)) throw invalid('element', `"${symbol}" is not an element symbol`);
  return parseFormula(symbol, 'element').molarMassGPerMol;
}

/** How many atoms of `symbol` one formula unit holds (0 when absent). */
export function atomsOf(parsed: ParsedFormula, symbol: string): number {
  return parsed.atoms[symbol] ?? 0;
}
