import { describe, expect, it } from 'vitest';
import { HAZARD_STATEMENTS, PICTOGRAMS, type PictogramCode } from '../../../shared-model/hazards/ghs';
import { pictogramSvg } from '../../../shared-model/hazards/pictogram-svg';
import { hasPrecautionsFor, precautionsFor, PRECAUTIONARY_STATEMENTS } from '../../../shared-model/hazards/precautions';

describe('precautionary statements', () => {
  it('carry the UN GHS Annex 3 texts (Rev. 9, Section 2; from memory)', () => {
    expect(PRECAUTIONARY_STATEMENTS.P280).toBe(
      'Wear protective gloves/protective clothing/eye protection/face protection.',
    );
    expect(PRECAUTIONARY_STATEMENTS['P305+P351+P338']).toBe(
      'IF IN EYES: Rinse cautiously with water for several minutes. Remove contact lenses, if present and easy to do. Continue rinsing.',
    );
    expect(PRECAUTIONARY_STATEMENTS.P223).toBe('Do not allow contact with water.');
    expect(PRECAUTIONARY_STATEMENTS.P273).toBe('Avoid release to the environment.');
  });

  it('exist for every hazard statement Pairwright uses', () => {
    const missing = Object.keys(HAZARD_STATEMENTS).filter((code) => !hasPrecautionsFor(code));
    expect(missing).toEqual([]);
  });

  it('list each statement once in P-number order with the hazards that ask for it', () => {
    // Sodium borohydride's typical classification (H260, H301, H314, H360; verify with the SDS).
    const lines = precautionsFor(['H314', 'H260', 'H301', 'H360']);
    const codes = lines.map((l) => l.code);
    expect(new Set(codes).size).toBe(codes.length);
    expect(codes.indexOf('P201')).toBeLessThan(codes.indexOf('P223'));
    expect(codes.indexOf('P280')).toBeLessThan(codes.indexOf('P501'));
    expect(lines.find((l) => l.code === 'P280')?.forHazards).toEqual(['H260', 'H314', 'H360']);
    expect(lines.find((l) => l.code === 'P223')?.forHazards).toEqual(['H260']);
    expect(precautionsFor([])).toEqual([]);
  });
});

describe('pictogram drawings', () => {
  it('draw each of the nine pictograms as a red-framed diamond with a black symbol, titled by name', () => {
    for (const code of Object.keys(PICTOGRAMS) as PictogramCode[]) {
      const svg = pictogramSvg(code, 40);
      expect(svg.startsWith('<svg xmlns="http://www.w3.org/2000/svg"')).toBe(true);
      expect(svg).toContain(`<title>${code} ${PICTOGRAMS[code]}</title>`);
      expect(svg).toContain('points="50,4 96,50 50,96 4,50"');
      expect(svg).toContain('stroke="#e2001a"');
      expect(svg).toMatch(/<g fill="#000">.+<\/g><\/svg>$/);
      expect(svg).toContain('width="40"');
    }
    expect(new Set(Object.keys(PICTOGRAMS).map((c) => pictogramSvg(c as PictogramCode))).size).toBe(9);
  });
});
