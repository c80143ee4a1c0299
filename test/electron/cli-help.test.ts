import { describe, expect, it } from 'vitest';
import { GLOSSARY } from '../../shared-model/glossary/terms';
import { runPairwright, runPairwrightJson } from '../support/cli';

describe('pairwright help terms', () => {
  it('prints the glossary as text and as JSON', () => {
    const text = runPairwright(['help', 'terms']);
    expect(text.status).toBe(0);
    expect(text.stdout).toContain('Warren–Cowley α');
    expect(text.stdout).toContain('Kass & Raftery, J. Am. Stat. Assoc. 90, 773 (1995)');
    const json = runPairwrightJson<{ terms: { id: string }[] }>(['help', 'terms']);
    expect(json.terms.map((t) => t.id)).toEqual(GLOSSARY.map((t) => t.id));
  });

  it('general help points to the glossary', () => {
    const help = runPairwright(['--help']);
    expect(help.status).toBe(0);
    expect(help.stdout).toContain('pairwright help terms');
  });
});
