/**
 * The glossary: every symbol and word the views and the CLI use that a new group member may not know, each in one
 * or two sentences with where it comes from. The help panel (renderer) and `pairwright help terms` (CLI) both read
 * this list, so the two never disagree.
 */

export interface GlossaryTerm {
  /** Stable key, used for links and tests. */
  id: string;
  /** The term as it appears on screen. */
  term: string;
  /** One or two sentences. */
  meaning: string;
  /** Where the definition comes from: a publication, "this app" for our own conventions, or "common practice". */
  source: string;
}

export const GLOSSARY: readonly GlossaryTerm[] = [
  {
    id: 'enrichment',
    term: 'E (surface enrichment)',
    meaning:
      'How much of the particle surface the enriched element takes beyond its share of the particle: ' +
      'E = (x_surface − x)/(1 − x), 0 for no enrichment and 1 for a complete shell of that element.',
    source: 'this app (a normalised form of the Langmuir–McLean surface excess)',
  },
  {
    id: 'omega',
    term: 'ω (interaction parameter)',
    meaning:
      'The regular-solution energy of swapping like bonds for unlike ones, per bond: negative when A–B bonds are ' +
      'preferred (mixing, ordering), positive when like atoms cluster (demixing). Here it is derived from the ' +
      'Miedema mixing enthalpy.',
    source: 'Wynblatt & Ku, Surf. Sci. 65, 511 (1977); de Boer et al., Cohesion in Metals (1988)',
  },
  {
    id: 'dhmix',
    term: 'ΔHmix (mixing enthalpy)',
    meaning:
      'The enthalpy change when the pure solid metals form a random solid solution, in kJ per mole of atoms; the sum ' +
      'of a chemical part (electronegativity and electron density differences) and an elastic part (size mismatch).',
    source: 'Miedema model, de Boer et al., Cohesion in Metals (1988)',
  },
  {
    id: 'warren-cowley',
    term: 'Warren–Cowley α',
    meaning:
      'Short-range order of the first neighbour shell: α = 1 − P(unlike neighbour)/x_other. α ≈ 0 is a random alloy, ' +
      'α < 0 means unlike neighbours are preferred (ordering), α > 0 means like atoms cluster (segregation, Janus).',
    source: 'Cowley, Phys. Rev. 77, 669 (1950)',
  },
  {
    id: 'unlike-ratio',
    term: 'Unlike-neighbour ratio',
    meaning:
      'The fraction of A–B nearest-neighbour bonds in the particle divided by the fraction a random arrangement of the ' +
      'same atoms would have: 1 for a random alloy, below 1 when like atoms cluster, above 1 for ordering.',
    source: 'this app (equal to 1 − α averaged over both elements for a bulk random alloy)',
  },
  {
    id: 'delta-bic',
    term: 'ΔBIC and the evidence words',
    meaning:
      'The difference in Bayesian information criterion between the best and the next line-scan model; lower BIC is ' +
      'better. ΔBIC < 2 is weak evidence, 2–6 positive, 6–10 strong, above 10 very strong.',
    source: 'Schwarz, Ann. Stat. 6, 461 (1978); Kass & Raftery, J. Am. Stat. Assoc. 90, 773 (1995)',
  },
  {
    id: 'agree-in-kind',
    term: 'Agree in kind',
    meaning:
      'A prediction and an outcome agree in kind when they name the same sort of architecture (both alloy, both ' +
      'core@shell, both Janus) even if the labels differ — e.g. Pd@Au predicted and Au@Pd observed.',
    source: 'this app',
  },
  {
    id: 'monolayer',
    term: 'Monolayer (ML)',
    meaning:
      'One atomic layer of the shell. On close-packed (111) facets of an fcc metal one monolayer is a/√3 thick, with a ' +
      'the lattice constant (0.235 nm for Au).',
    source: 'fcc geometry (Kittel, Introduction to Solid State Physics)',
  },
  {
    id: 'route-co-reduction',
    term: 'Co-reduction',
    meaning:
      'Both metal salts are reduced together in one pot, usually by a strong reducer such as sodium borohydride; the ' +
      'salt that is easier to reduce tends to nucleate first and can end up in the core.',
    source: 'common practice',
  },
  {
    id: 'route-seed-mediated',
    term: 'Seed-mediated growth',
    meaning:
      'Ready-made seed particles of one metal are coated with the other by reducing its salt slowly with a mild reducer ' +
      '(ascorbic acid, for example), so that the new metal grows on the seeds instead of nucleating alone.',
    source: 'common practice',
  },
  {
    id: 'route-polyol',
    term: 'Polyol route',
    meaning:
      'The salts are reduced by a hot polyol (ethylene glycol, for example) that is both solvent and reducer, usually ' +
      'with PVP as capping agent, at 140–200 °C.',
    source: 'common practice (Fiévet et al., Solid State Ionics 32/33, 198 (1989))',
  },
  {
    id: 'route-oleylamine',
    term: 'Oleylamine / organic route',
    meaning:
      'Metal salts or acetylacetonates are reduced in hot oleylamine (solvent, reducer and capping agent at once), ' +
      'sometimes with oleic acid or a borane complex, under inert gas.',
    source: 'common practice',
  },
];

/** The glossary as plain text: one block per term (for the CLI and the printable help). */
export function glossaryText(terms: readonly GlossaryTerm[] = GLOSSARY): string {
  return terms.map((t) => `${t.term}\n  ${t.meaning}\n  Source: ${t.source}`).join('\n\n');
}
