/**
 * Extended XYZ for clusters (no periodic cell): line 1 the atom count, line 2 key=value pairs with
 * `Properties=species:S:1:pos:R:3` (the convention read by ASE, OVITO and others), then one line per
 * atom. Coordinates in Å.
 */
import { invalid } from '../api/result';
import type { AtomicStructure } from './gupta-energy';

export interface XyzFrame extends AtomicStructure {
  /** Other key=value pairs of the comment line (strings as written, quotes removed). */
  info: Record<string, string>;
}

function formatValue(value: string | number | boolean): string {
  if (typeof value === 'boolean') return value ? 'T' : 'F';
  if (typeof value === 'number') {
    if (!Number.isFinite(value)) throw new RangeError(`cannot write a non-finite number (${value}) into extended XYZ`);
    return String(value);
  }
  return /[\s"=]/.test(value) || value === '' ? `"${value.replace(/\\/g, '\\\\').replace(/"/g, '\\"')}"` : value;
}

/** Writes one frame. `info` keys must be plain words; values are quoted when they contain spaces. */
export function writeExtendedXyz(
  structure: AtomicStructure,
  info: Record<string, string | number | boolean> = {},
): string {
  const atoms = structure.symbols.length;
  if (structure.positions.length !== 3 * atoms)
    throw new RangeError(`expected ${3 * atoms} coordinates, got ${structure.positions.length}`);
  const pairs = ['Properties=species:S:1:pos:R:3', 'pbc="F F F"'];
  for (const [key, value] of Object.entries(info)) {
    if (!/^[A-Za-z_][A-Za-z0-9_]*$/.test(key)) throw new RangeError(`extended XYZ key "${key}" must be a plain word`);
    if (key === 'Properties' || key === 'pbc' || key === 'Lattice') continue;
    pairs.push(`${key}=${formatValue(value)}`);
  }
  const lines = [String(atoms), pairs.join(' ')];
  const p = structure.positions;
  for (let i = 0; i < atoms; i++) {
    lines.push(
      `${structure.symbols[i]} ${p[3 * i]!.toFixed(8)} ${p[3 * i + 1]!.toFixed(8)} ${p[3 * i + 2]!.toFixed(8)}`,
    );
  }
  return lines.join('\n') + '\n';
}

/** Splits the comment line into key=value pairs, honouring double quotes and backslash escapes. */
export function parseCommentLine(line: string): Record<string, string> {
  const out: Record<string, string> = {};
  let k = 0;
  const n = line.length;
  while (k < n) {
    while (k < n && /\s/.test(line[k]!)) k++;
    if (k >= n) break;
    let key = '';
    while (k < n && line[k] !== '=' && !/\s/.test(line[k]!)) key += line[k++];
    if (line[k] !== '=') {
      out[key] = 'T'; // a bare word is a true flag
      continue;
    }
    k++;
    let value = '';
    if (line[k] === '"') {
      k++;
      while (k < n && line[k] !== '"') {
        if (line[k] === '\\' && k + 1 < n) k++;
        value += line[k++];
      }
      k++;
    } else {
      while (k < n && !/\s/.test(line[k]!)) value += line[k++];
    }
    out[key] = value;
  }
  return out;
}

interface PropertyColumn {
  name: string;
  type: string;
  width: number;
}

function parseProperties(spec: string): PropertyColumn[] {
  const parts = spec.split(':');
  if (parts.length % 3 !== 0) throw invalid('xyz', `Properties "${spec}" must be name:type:count triples`);
  const out: PropertyColumn[] = [];
  for (let k = 0; k < parts.length; k += 3) {
    const width = Number(parts[k + 2]);
    if (!Number.isInteger(width) || width < 1)
      throw invalid('xyz', `Properties column "${parts[k]}" has a bad count "${parts[k + 2]}"`);
    out.push({ name: parts[k]!, type: parts[k + 1]!.toUpperCase(), width });
  }
  return out;
}

/**
 * Reads the first frame of an (extended) XYZ text. Plain XYZ (no Properties) is read as species then
 * x y z. A periodic cell (Lattice with pbc true) is refused: the energy of a structure here is that of
 * a free cluster.
 */
/** Two atoms closer than this are taken as one place (0.0001 Å; far below any bond length, common practice). */
const SAME_PLACE_ANGSTROM = 1e-4;

/** Refuses two atoms at the same position, naming both lines (an energy or a swap there is meaningless). */
function checkDistinctPositions(positions: Float64Array, firstLineIndex: number): void {
  const seen = new Map<string, number>();
  const atoms = positions.length / 3;
  for (let i = 0; i < atoms; i++) {
    const key = [0, 1, 2].map((d) => Math.round((positions[3 * i + d] as number) / SAME_PLACE_ANGSTROM)).join(',');
    const earlier = seen.get(key);
    if (earlier !== undefined) {
      const at = [0, 1, 2].map((d) => positions[3 * i + d]).join(' ');
      throw invalid(
        'xyz',
        `lines ${firstLineIndex + earlier + 1} and ${firstLineIndex + i + 1}: two atoms at the same position (${at} Å)`,
      );
    }
    seen.set(key, i);
  }
}

export function readExtendedXyz(text: string): XyzFrame {
  const lines = text.replace(/\r\n?/g, '\n').split('\n');
  let start = 0;
  while (start < lines.length && lines[start]!.trim() === '') start++;
  if (start >= lines.length) throw invalid('xyz', 'the file is empty');
  const countText = lines[start]!.trim();
  const atoms = Number(countText);
  if (!Number.isInteger(atoms) || atoms < 1)
    throw invalid('xyz', `line ${start + 1} must be the number of atoms, got "${countText}"`);
  // Checked before any array is sized by it: a huge count would otherwise be a RangeError from the allocation.
  const atomLines = lines.length - start - 2;
  if (atoms > atomLines) {
    throw invalid(
      'xyz',
      `line ${start + 1}: expected ${atoms} atom lines, the file has at most ${Math.max(0, atomLines)}`,
    );
  }
  const info = parseCommentLine(lines[start + 1] ?? '');
  if (info.Lattice !== undefined) {
    const pbc = (info.pbc ?? 'T T T').trim().split(/\s+/);
    if (pbc.some((flag) => /^(t|true|1)$/i.test(flag))) {
      throw invalid(
        'xyz',
        'the structure has a periodic cell (Lattice with pbc true); give a free cluster without a periodic cell',
      );
    }
  }
  const columns = info.Properties
    ? parseProperties(info.Properties)
    : [
        { name: 'species', type: 'S', width: 1 },
        { name: 'pos', type: 'R', width: 3 },
      ];
  let speciesColumn = -1;
  let posColumn = -1;
  let col = 0;
  for (const c of columns) {
    if (c.name === 'species' && c.type === 'S' && c.width === 1) speciesColumn = col;
    if (c.name === 'pos' && c.type === 'R' && c.width === 3) posColumn = col;
    col += c.width;
  }
  if (speciesColumn < 0) throw invalid('xyz', 'Properties has no species:S:1 column');
  if (posColumn < 0) throw invalid('xyz', 'Properties has no pos:R:3 column');
  const symbols: string[] = [];
  const positions = new Float64Array(3 * atoms);
  for (let i = 0; i < atoms; i++) {
    const lineNo = start + 2 + i;
    const line = lines[lineNo];
    if (line === undefined || line.trim() === '') throw invalid('xyz', `expected ${atoms} atom lines, found ${i}`);
    const fields = line.trim().split(/\s+/);
    if (fields.length < col)
      throw invalid('xyz', `line ${lineNo + 1} has ${fields.length} columns, Properties needs ${col}`);
    const raw = fields[speciesColumn]!;
    const symbol = raw.charAt(0).toUpperCase() + raw.slice(1).toLowerCase();
    symbols.push(symbol);
    for (let d = 0; d < 3; d++) {
      const value = Number(fields[posColumn + d]);
      if (!Number.isFinite(value))
        throw invalid('xyz', `line ${lineNo + 1}: coordinate "${fields[posColumn + d]}" is not a number`);
      positions[3 * i + d] = value;
    }
  }
  checkDistinctPositions(positions, start + 2);
  return { symbols, positions, info };
}
