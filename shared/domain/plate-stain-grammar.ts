import { normaliseName, resolvePhase, stainIndex } from '../catalogue/lookup';
import { stationaryPhaseByKey, stationaryPhases } from '../catalogue/stationary-phases';

/**
 * How people write plates and stains in a group's sheets, read with the same care as eluent notations:
 * a name, then qualifiers (brand, grade, F254, "(weak)", "after heating", "120 °C", "heat gun", "dip").
 * What is recognised is stored; what is not is named in a warning and the raw text stays on the record.
 * The qualifier words are common practice in lab notebooks (no single source).
 */

/** One visualisation read from a cell: a catalogue key and the qualifiers written with it. */
interface StainReading {
  method: string;
  note: string | null;
}

export interface StainsRead {
  items: StainReading[];
  /** Parts of the text no stain was recognised in, as written. */
  unrecognised: string[];
}

/** Stains by normalised name, looked up exactly (the grammar tries many sub-phrases; fuzzy suggestions are not wanted). */
let stainNames: Map<string, { key: string }> | null = null;
function resolveStain(text: string): { ok: true; value: { key: string } } | { ok: false } {
  stainNames ??= new Map(stainIndex.normalisedNames());
  const found = stainNames.get(normaliseName(text));
  return found ? { ok: true, value: found } : { ok: false };
}

/** Words that say how or how strongly a stain showed, kept as the item's note. */
const QUALIFIER = new RegExp(
  [
    String.raw`after\s+heat(?:ing)?`,
    String.raw`with\s+heat(?:ing)?`,
    String.raw`heat\s*gun`,
    String.raw`hot\s*plate`,
    String.raw`heat(?:ed|ing)?`,
    String.raw`char(?:red|ring)?`,
    String.raw`\d{2,3}\s*°?\s*C\b`,
    String.raw`\d{2,3}\s*deg(?:rees)?\s*C?\b`,
    String.raw`(?:very\s+)?(?:weak(?:ly)?|faint(?:ly)?|strong(?:ly)?|intense|visible|barely(?:\s+visible)?|bright|dark|pale)`,
    'dip(?:ped)?',
    'spray(?:ed)?',
    'stain(?:ed)?',
    'developed',
    'vis(?:ualised|ualized)?',
    'only',
    'lamp',
    'light',
    'nm',
    'reagent',
    'solution',
    'chamber',
    'tank',
    'vapou?r',
    'Δ',
    'then',
    'on\\s+plate',
  ]
    .map((word) => `(?:${word})`)
    .join('|'),
  'gi',
);

const QUALIFIER_ONLY = new RegExp(`^(?:\\s|,|\\+|&|and|${QUALIFIER.source})*$`, 'i');

/** Splits a list at , ; / + & "and" "then" — but not a comma or slash between digits ("2,4-DNP", "254/365") nor inside brackets. */
function splitList(text: string): string[] {
  const parts: string[] = [];
  let depth = 0;
  let current = '';
  for (let i = 0; i < text.length; i++) {
    const char = text[i];
    if ('([{'.includes(char)) depth++;
    if (')]}'.includes(char)) depth = Math.max(0, depth - 1);
    const between = /\d/.test(text[i - 1] ?? '') && /\d/.test(text[i + 1] ?? '');
    if (depth === 0 && (';+&'.includes(char) || ((char === ',' || char === '/') && !between))) {
      parts.push(current);
      current = '';
      continue;
    }
    current += char;
  }
  parts.push(current);
  return parts
    .flatMap((part) => part.split(/\s+(?:and|then|&)\s+/i))
    .map((part) => part.trim())
    .filter(Boolean);
}

/** The catalogue stain named by the longest leading run of words, and the rest of the text. */
function leadingStain(text: string): { key: string; rest: string } | null {
  const exact = resolveStain(text);
  if (exact.ok) return { key: exact.value.key, rest: '' };
  const words = text.split(/\s+/);
  for (let count = Math.min(words.length, 5); count >= 1; count--) {
    for (let start = 0; start + count <= words.length; start++) {
      const candidate = words
        .slice(start, start + count)
        .join(' ')
        .replace(/^[([]|[)\],.:]$/g, '');
      const found = candidate ? resolveStain(candidate) : null;
      if (found?.ok)
        return { key: found.value.key, rest: [...words.slice(0, start), ...words.slice(start + count)].join(' ') };
    }
  }
  return null;
}

function cleanNote(text: string): string | null {
  const note = text
    .replace(/[()[\]]/g, ' ')
    .replace(/\s*[,;]\s*/g, ', ')
    .replace(/\s+/g, ' ')
    .replace(/^[\s,]+|[\s,]+$/g, '');
  return note ? note.slice(0, 200) : null;
}

/**
 * Visualisations listed in one cell: "UV 254/365", "2,4-DNP", "ninhydrin (after heating)", "PMA + heat gun",
 * "vanillin dip, 120 °C", "UV (faint); KMnO4", "iodine and CAM". A part made only of qualifiers
 * ("heat gun", "120 °C") qualifies the stain before it.
 */
export function readStains(cell: string): StainsRead {
  const text = cell
    .trim()
    .replace(/\bUV\s*\(?\s*(\d{3})\s*(?:nm)?\s*(?:\/|,|&|and|\+)\s*(\d{3})\s*(?:nm)?\s*\)?/gi, 'UV $1; UV $2')
    .replace(/\bUV\s*[-–]?\s*(254|365)\s*nm\b/gi, 'UV $1');
  const items: StainReading[] = [];
  const unrecognised: string[] = [];
  if (!text) return { items, unrecognised };
  for (const part of splitList(text)) {
    if (QUALIFIER_ONLY.test(part)) {
      const last = items[items.length - 1];
      if (last) last.note = cleanNote([last.note, part].filter(Boolean).join(', '));
      continue;
    }
    const whole = resolveStain(part);
    if (whole.ok) {
      items.push({ method: whole.value.key, note: null });
      continue;
    }
    const bracketed = [...part.matchAll(/\(([^)]*)\)/g)].map((match) => match[1]);
    const outside = part
      .replace(/\([^)]*\)/g, ' ')
      .replace(/\s+/g, ' ')
      .trim();
    const found = leadingStain(outside) ?? leadingStain(part.replace(/[()]/g, ' ').replace(/\s+/g, ' ').trim());
    if (!found) {
      unrecognised.push(part);
      continue;
    }
    const leftover = found.rest
      .replace(QUALIFIER, ' ')
      .replace(/[\s,.:-]+/g, ' ')
      .trim();
    if (leftover && !/^\d{3}$/.test(leftover)) unrecognised.push(part);
    items.push({ method: found.key, note: cleanNote([found.rest, ...bracketed].filter(Boolean).join(', ')) });
  }
  return { items, unrecognised };
}

type PlateFamily =
  'silica' | 'alumina-neutral' | 'alumina-basic' | 'alumina-acidic' | 'c18' | 'amine' | 'diol' | 'cyano' | 'paper';

export interface PlateRead {
  /** Catalogue key, or null when no phase was recognised. */
  key: string | null;
  /** Qualifiers read (brand, grade, indicator, backing), as written. */
  qualifiers: string[];
  /** Words neither a phase nor a known qualifier, as written. */
  unrecognised: string[];
}

const familyPatterns: [PlateFamily, RegExp][] = [
  ['alumina-basic', /\b(basic\s+(alumina|al2o3|aluminium oxide|aluminum oxide)|(alumina|al2o3)\s*,?\s*basic)\b/i],
  ['alumina-acidic', /\b(acidic\s+(alumina|al2o3)|(alumina|al2o3)\s*,?\s*acidic)\b/i],
  ['alumina-neutral', /\b(alumina|al2o3|aluminium oxide|aluminum oxide)\b/i],
  ['c18', /\b(c\s*-?18|rp\s*-?18|ods|reversed?[\s-]phase)\b/i],
  ['amine', /\b(nh2|amino(propyl)?|amine)\b/i],
  ['diol', /\bdiol\b/i],
  ['cyano', /\b(cn|cyano(propyl)?)\b/i],
  ['paper', /\b(paper|cellulose)\b/i],
  ['silica', /\b(silica|sio2|si\s*gel|silicagel|kieselgel|si\s*60|si)\b/i],
];

/** Qualifiers of plates and column media (brands, grades, indicator, backing, form): kept, never a warning. */
const PLATE_QUALIFIER = new RegExp(
  [
    String.raw`f\s*254s?`,
    String.raw`f\s*366`,
    'uv\\s*254',
    'gel',
    'g',
    '60',
    '40',
    '100',
    'h',
    'hptlc',
    'tlc',
    'ptlc',
    'plates?',
    'sheets?',
    'precoated',
    'pre-coated',
    'glass',
    'aluminium',
    'aluminum',
    'alu',
    'plastic',
    'backed',
    'backing',
    'on',
    'with',
    'indicator',
    'fluorescent',
    'flash',
    'column',
    'grade',
    'mesh',
    'µm',
    'um',
    'micron',
    'nm',
    'merck',
    'macherey[\\s-]?nagel',
    'mn',
    'sigma',
    'aldrich',
    'sigma-aldrich',
    'fluka',
    'silicycle',
    'analtech',
    'whatman',
    'sorbent',
    'biotage',
    'teledyne',
    'isco',
    'redisep',
    'fisher',
    'vwr',
    'supelco',
    'alugram',
    'polygram',
    'silg',
    'sil',
    'type',
    'kg',
    'prep',
    'preparative',
    'analytical',
    'normal',
    'phase',
    'neutral',
    'basic',
    'acidic',
    'activity',
    'brockmann',
    'i{1,3}',
    'iv',
    'v',
    'bonded',
    'silica',
    'sio2',
    'si',
    'kieselgel',
    'alumina',
    'al2o3',
    'aluminium oxide',
    'oxide',
    '\\d+(?:[-–]\\d+)?',
    'a',
    'of',
    'and',
    '&',
    'x',
    'cm',
    'mm',
    'å',
    'angstrom',
    'pore',
    'size',
    'coated',
    'tlc-plate',
    'kg60',
  ].join('|'),
  'i',
);
const qualifierWord = new RegExp(`^(?:${PLATE_QUALIFIER.source})$`, 'i');

/** TLC-plate key for a family on a TLC or preparative TLC row (only silica has a separate plate entry). */
const tlcKey: Partial<Record<PlateFamily, string>> = { silica: 'silica-tlc-f254' };
const familyKey: Record<PlateFamily, string> = {
  silica: 'silica-gel',
  'alumina-neutral': 'alumina-neutral',
  'alumina-basic': 'alumina-basic',
  'alumina-acidic': 'alumina-acidic',
  c18: 'c18',
  amine: 'amine-silica',
  diol: 'diol-silica',
  cyano: 'cyano-silica',
  paper: 'paper',
};

const exactNames = new Map(stationaryPhases.map((phase) => [phase.name.toLowerCase(), phase.key]));

/**
 * A plate or column medium as written: "SiO2 (Merck 60)", "Si gel 60 F254", "silica, glass-backed",
 * "Al2O3 basic", "RP-18 F254s". On a TLC row silica is the silica TLC plate, on a column the column silica;
 * a catalogue name written out in full (as the app's own export writes it) is taken as it is.
 */
export function readPlate(cell: string, technique: 'tlc' | 'flash' | 'prep_tlc'): PlateRead {
  const text = cell.trim();
  const exact = exactNames.get(text.toLowerCase());
  if (exact) return { key: exact, qualifiers: [], unrecognised: [] };
  const isPlate = technique !== 'flash';
  const family = familyPatterns.find(([, pattern]) => pattern.test(text))?.[0] ?? null;
  const words = text
    .replace(/[()[\],;:/+]/g, ' ')
    .split(/\s+/)
    .filter(Boolean);
  const known = (word: string) =>
    qualifierWord.test(word.replace(/[.-]+$/, '')) || familyPatterns.some(([, pattern]) => pattern.test(word));
  const unrecognised = words.filter((word) => !known(word) && !word.split(/[-–]/).filter(Boolean).every(known));
  const qualifiers = words.filter((word) => !unrecognised.includes(word));
  if (!family) {
    const found = resolvePhase(text);
    if (found.ok)
      return {
        key: isPlate && found.value.key === 'silica-gel' ? 'silica-tlc-f254' : found.value.key,
        qualifiers: [],
        unrecognised: [],
      };
    return { key: null, qualifiers: [], unrecognised: text ? [text] : [] };
  }
  const key = (isPlate ? tlcKey[family] : undefined) ?? familyKey[family];
  return { key: stationaryPhaseByKey(key) ? key : null, qualifiers, unrecognised };
}
