import { describe, expect, it } from 'vitest';
import { GLOSSARY, glossaryText } from '../../../shared-model/glossary/terms';

describe('glossary', () => {
  it('explains every term the views and the CLI print, each with a source', () => {
    const terms = GLOSSARY.map((t) => t.term).join(' | ');
    for (const needed of [
      'E (surface enrichment)',
      'ω',
      'ΔHmix',
      'Warren–Cowley α',
      'Unlike-neighbour ratio',
      'ΔBIC',
    ]) {
      expect(terms).toContain(needed);
    }
    for (const route of ['Co-reduction', 'Seed-mediated growth', 'Polyol', 'Oleylamine'])
      expect(terms).toContain(route);
    expect(terms).toContain('Agree in kind');
    expect(terms).toContain('Monolayer');
    for (const t of GLOSSARY) {
      expect(t.meaning.length, t.id).toBeGreaterThan(40);
      expect(t.source.trim().length, t.id).toBeGreaterThan(3);
    }
    expect(new Set(GLOSSARY.map((t) => t.id)).size).toBe(GLOSSARY.length);
  });

  it('states the ΔBIC evidence thresholds the line-scan fit uses (Kass & Raftery 1995)', () => {
    const bic = GLOSSARY.find((t) => t.id === 'delta-bic');
    expect(bic?.meaning).toMatch(/< 2 is weak evidence, 2–6 positive, 6–10 strong, above 10 very strong/);
  });

  it('prints one block per term with its source', () => {
    const text = glossaryText();
    expect(text.split('\n\n')).toHaveLength(GLOSSARY.length);
    expect(text).toContain('Source: Cowley, Phys. Rev. 77, 669 (1950)');
  });
});
