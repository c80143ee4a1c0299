/**
 * Architecture labels (DOMAIN.md "Words"). Core@shell labels carry the element symbols in trade
 * notation: "Ni@Pt" is a Ni core under a Pt shell.
 */
export type ArchitectureKind =
  'alloy' | 'surface-enriched alloy' | 'core@shell' | 'Janus' | 'intermetallic' | 'unknown' | 'hollow' | 'other';

/** Kinds a prediction or simulation can give; outcomes may also be 'hollow' or 'other'. */
export const PREDICTED_KINDS = [
  'alloy',
  'surface-enriched alloy',
  'core@shell',
  'Janus',
  'intermetallic',
  'unknown',
] as const;
export const OUTCOME_ONLY_KINDS = ['hollow', 'other'] as const;

/** A label as shown and stored: "alloy", "surface-enriched alloy", "Ni@Pt", "Janus", "intermetallic", "unknown", "hollow", "other". */
export type ArchitectureLabel = string;

export function coreShellLabel(core: string, shell: string): ArchitectureLabel {
  return `${core}@${shell}`;
}

export interface ParsedArchitecture {
  kind: ArchitectureKind;
  core?: string;
  shell?: string;
}

const PLAIN_KINDS: readonly ArchitectureKind[] = [
  'alloy',
  'surface-enriched alloy',
  'Janus',
  'intermetallic',
  'unknown',
  'hollow',
  'other',
];

/**
 * Reads a label typed by a user or stored earlier. Returns null when it is none of the known forms.
 * Case-insensitive for the plain kinds ("janus" → "Janus"); element symbols must be valid symbols of the pair
 * when `pair` is given.
 */
export function parseArchitecture(label: string, pair?: readonly [string, string]): ParsedArchitecture | null {
  const trimmed = label.trim();
  const plain = PLAIN_KINDS.find((kind) => kind.toLowerCase() === trimmed.toLowerCase());
  if (plain) return { kind: plain };
  const match = /^([A-Z][a-z]?)\s*@\s*([A-Z][a-z]?)$/.exec(trimmed);
  if (!match) return null;
  const core = match[1] as string;
  const shell = match[2] as string;
  if (core === shell) return null;
  if (pair && !(pair.includes(core) && pair.includes(shell))) return null;
  return { kind: 'core@shell', core, shell };
}

export function formatArchitecture(parsed: ParsedArchitecture): ArchitectureLabel {
  if (parsed.kind === 'core@shell') {
    if (!parsed.core || !parsed.shell) throw new Error('core@shell label needs both core and shell elements');
    return coreShellLabel(parsed.core, parsed.shell);
  }
  return parsed.kind;
}

/** Human sentence for a label, used in legends ("Ni core under a Pt shell"). */
export function describeArchitecture(label: ArchitectureLabel): string {
  const parsed = parseArchitecture(label);
  if (!parsed) return label;
  switch (parsed.kind) {
    case 'alloy':
      return 'mixed alloy, no marked surface enrichment';
    case 'surface-enriched alloy':
      return 'mixed alloy with one element enriched at the surface';
    case 'core@shell':
      return `${parsed.core} core under a ${parsed.shell} shell`;
    case 'Janus':
      return 'phase-separated: both elements exposed in separate domains';
    case 'intermetallic':
      return 'ordered intermetallic (unlike neighbours preferred)';
    case 'hollow':
      return 'hollow particle (e.g. after galvanic replacement)';
    case 'other':
      return 'other outcome';
    case 'unknown':
      return 'not determined';
  }
}
