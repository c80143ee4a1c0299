/**
 * Validation messages that speak to the user. Schemas state what is wrong as a predicate ("must not be
 * empty", "must be at most 120 characters"); this names the field in words in front of it ("The description
 * must be at most 2000 characters") or asks for what is missing ("Give the campaign a name"), instead of
 * the code path ("name: must not be empty"). Used for every zod refusal of an operation's input, for the
 * reagent form and for the prediction conditions, so the CLI, the host and the window say the same.
 */

/** Input keys in words, where splitting the camelCase name would not say it well. */
const FIELD_WORDS: Record<string, string> = {
  xB: 'composition',
  atPercentB: 'composition',
  elementA: 'first element',
  elementB: 'second element',
  campaignId: 'campaign id',
  batchId: 'batch id',
  pairId: 'pair id',
  seedBatchId: 'seed batch id',
  runId: 'run id',
  id: 'id',
  csvText: 'CSV text',
  hCodes: 'H-codes',
  pCodes: 'P-statements',
  probeSigmaNm: 'probe width σ (nm)',
  timeH: 'time (h)',
  target: 'target architecture',
  includeArchived: 'archived switch',
};

/** Unit suffixes of input names, as they are written beside a number. */
const UNIT_SUFFIXES: Array<[suffix: string, unit: string]> = [
  ['PerMol', 'per mol'],
  ['Bar', 'bar'],
  ['Nm', 'nm'],
  ['Mm', 'mM'],
  ['Ml', 'mL'],
  ['Mg', 'mg'],
  ['Ev', 'eV'],
  ['K', 'K'],
  ['C', '°C'],
  ['H', 'h'],
];

/** The words for one input key: "diameterNm" → "diameter (nm)", "totalMetalMm" → "total metal (mM)". */
export function keyWords(key: string): string {
  const known = FIELD_WORDS[key];
  if (known !== undefined) return known;
  let stem = key;
  let unit = '';
  for (const [suffix, words] of UNIT_SUFFIXES) {
    if (
      stem.length > suffix.length &&
      stem.endsWith(suffix) &&
      /[a-z]/.test(stem.charAt(stem.length - suffix.length - 1))
    ) {
      stem = stem.slice(0, -suffix.length);
      unit = words;
      break;
    }
  }
  const words = stem
    .replace(/([a-z0-9])([A-Z])/g, '$1 $2')
    .replace(/_/g, ' ')
    .toLowerCase();
  return unit === '' ? words : `${words} (${unit})`;
}

/**
 * The words for a dotted input path: the last key, with the list entry it sits in
 * ("measurements.1.xB" → "composition of measurement entry 2"); '' for the input as a whole.
 */
export function fieldWords(path: ReadonlyArray<PropertyKey>): string {
  const keys = path.map((part) => (typeof part === 'symbol' ? String(part.description) : part));
  let last = keys.length - 1;
  const entries: string[] = [];
  while (last >= 0 && typeof keys[last] === 'number') last--;
  if (last < 0) return keys.length > 0 ? `entry ${Number(keys[keys.length - 1]) + 1}` : '';
  for (let i = last - 1; i >= 0; i--) {
    const part = keys[i];
    if (typeof part === 'number' || (typeof part === 'string' && /^\d+$/.test(part))) {
      const list = keys[i - 1];
      entries.push(`${typeof list === 'string' ? keyWords(list) : 'list'} entry ${Number(part) + 1}`);
      break;
    }
  }
  const key = String(keys[last]);
  const words = /^\d+$/.test(key) ? `entry ${Number(key) + 1}` : keyWords(key);
  return entries.length === 0 ? words : `${words} of ${entries.join(', ')}`;
}

/** What an operation area is about, for "Give the … a name": campaigns.create → campaign. */
const SUBJECTS: Record<string, string> = {
  campaigns: 'campaign',
  pairs: 'pair',
  batches: 'batch',
  catalog: 'reagent',
  reagents: 'reagent',
  inventory: 'inventory row',
  outcomes: 'outcome',
  simulation: 'run',
  screen: 'screen',
};

/** The subject of an operation ("campaigns.create" → "campaign"), or null when it has none to name. */
export function operationSubject(operation: string | undefined): string | null {
  if (operation === undefined) return null;
  return SUBJECTS[operation.split('.')[0] ?? ''] ?? null;
}

const PREDICATE = /^(must|should|is |are |has |have |needs? |cannot|can't|may |expected )/;
const BOUND = /^(at least|at most|more than|less than|greater than|below|above) /;
const EMPTY = /^must not be empty\b/;

const article = (words: string) => (/^[aeiou]/i.test(words) ? 'an' : 'a');
const capitalise = (text: string) => text.charAt(0).toUpperCase() + text.slice(1);

/**
 * One sentence for a refusal of the field named `label` (words, '' for none): a predicate gets the field
 * in front ("The diameter (nm) must be greater than 0"), an empty field asks for it ("Give the campaign a
 * name"); a message that is a sentence of its own (naming the value, e.g. 'unknown element "Xx"') is kept.
 */
export function userMessage(label: string, message: string, subject: string | null = null): string {
  const text = message.trim();
  if (label === '') return capitalise(text);
  if (EMPTY.test(text)) {
    const rest = text.replace(EMPTY, '').replace(/^[;,:]\s*/, '');
    const ask = subject === null ? `Type the ${label}` : `Give the ${subject} ${article(label)} ${label}`;
    return rest === '' ? ask : `${ask} (${rest})`;
  }
  if (PREDICATE.test(text)) return `The ${label} ${text}`;
  if (BOUND.test(text)) return `The ${label} must be ${text}`;
  if (/^[A-Z]/.test(text) && !text.toLowerCase().includes(label.toLowerCase())) return `The ${label}: ${text}`;
  return text;
}
