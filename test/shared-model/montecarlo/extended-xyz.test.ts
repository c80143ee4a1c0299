import { describe, expect, it } from 'vitest';
import { DomainError } from '../../../shared-model/api/result';
import { parseCommentLine, readExtendedXyz, writeExtendedXyz } from '../../../shared-model/montecarlo/extended-xyz';
import { totalEnergy } from '../../../shared-model/montecarlo/gupta-energy';
import { buildCuboctahedron } from '../../../shared-model/clusters/shapes';

describe('extended XYZ', () => {
  it('round-trips species, positions and info', () => {
    const c = buildCuboctahedron(2, 2.8);
    const symbols = Array.from({ length: c.atoms }, (_, i) => (i % 3 === 0 ? 'Pd' : 'Ag'));
    const text = writeExtendedXyz(
      { symbols, positions: c.positions },
      { energy: -123.5, note: 'Ag-Pd run 4', engine: 'gupta-swap-mc-1' },
    );
    const lines = text.split('\n');
    expect(lines[0]).toBe('55');
    expect(lines[1]).toContain('Properties=species:S:1:pos:R:3');
    expect(lines[1]).toContain('note="Ag-Pd run 4"');
    const frame = readExtendedXyz(text);
    expect(frame.symbols).toEqual(symbols);
    for (let k = 0; k < c.positions.length; k++) expect(frame.positions[k]).toBeCloseTo(c.positions[k]!, 7);
    expect(frame.info.energy).toBe('-123.5');
    expect(frame.info.note).toBe('Ag-Pd run 4');
  });

  it('reads other column orders and extra columns, plain XYZ, and lower-case symbols', () => {
    const text =
      '2\nProperties=id:I:1:pos:R:3:species:S:1:mass:R:1 pbc="F F F"\n1 0 0 0 pt 195.08\n2 2.77 0 0 Pt 195.08\n';
    const frame = readExtendedXyz(text);
    expect(frame.symbols).toEqual(['Pt', 'Pt']);
    expect(Array.from(frame.positions)).toEqual([0, 0, 0, 2.77, 0, 0]);
    const plain = readExtendedXyz('2\nsome title\nAu 0 0 0\nAu 0 0 2.88\n');
    expect(plain.symbols).toEqual(['Au', 'Au']);
  });

  it('parses quoted values with escapes and bare flags', () => {
    expect(parseCommentLine('a=1 b="x y" c="q\\"q" flag')).toEqual({ a: '1', b: 'x y', c: 'q"q', flag: 'T' });
  });

  it('refuses periodic cells, truncated files and bad numbers with a clear message', () => {
    const bad = (text: string, pattern: RegExp) => {
      try {
        readExtendedXyz(text);
        expect.unreachable();
      } catch (error) {
        expect(error).toBeInstanceOf(DomainError);
        expect((error as DomainError).field).toBe('xyz');
        expect((error as DomainError).message).toMatch(pattern);
      }
    };
    bad('1\nLattice="4 0 0 0 4 0 0 0 4" Properties=species:S:1:pos:R:3 pbc="T T T"\nCu 0 0 0\n', /periodic/);
    bad('3\nProperties=species:S:1:pos:R:3\nCu 0 0 0\n', /expected 3 atom lines/);
    bad('1\nProperties=species:S:1:pos:R:3\nCu 0 x 0\n', /not a number/);
    bad('abc\n', /number of atoms/);
    bad('', /empty/);
  });

  it('energy of a structure with an unsupported element names the atom', () => {
    const frame = readExtendedXyz('2\n\nFe 0 0 0\nPt 0 0 2.7\n');
    try {
      totalEnergy(frame);
      expect.unreachable();
    } catch (error) {
      expect((error as DomainError).field).toBe('atoms[1].species');
      expect((error as DomainError).message).toMatch(/Fe/);
    }
  });
});
