import { normaliseName, solventIndex } from '../catalogue/lookup';
import { IGNORE_COLUMN, type ImportField } from '../schemas/import';

/**
 * Header names people give spreadsheet columns, per import field. Compared after headerKey folding, so
 * "Rf value", "RF_VALUE" and "rf-value" are one name. Collected from common practice in lab notebooks
 * and spreadsheets (no single source).
 */
const headerNames: Record<ImportField, readonly string[]> = {
  name: [
    'compound',
    'compound name',
    'name',
    'product',
    'product name',
    'substance',
    'molecule',
    'cmpd',
    'title',
    'target',
    'target compound',
  ],
  structure: [
    'smiles',
    'structure',
    'canonical smiles',
    'isomeric smiles',
    'smiles string',
    'mol',
    'molfile',
    'structure smiles',
    'compound smiles',
  ],
  phase: [
    'phase',
    'stationary phase',
    'adsorbent',
    'sorbent',
    'support',
    'plate',
    'tlc plate',
    'column material',
    'media',
    'packing',
  ],
  eluent: [
    'eluent',
    'eluant',
    'eluent system',
    'solvent system',
    'solvent',
    'solvents',
    'mobile phase',
    'tlc solvent',
    'tlc eluent',
    'column eluent',
    'developing solvent',
    'solvent mixture',
    'eluent ratio',
    'solvent ratio',
    'conditions',
    'tlc conditions',
  ],
  additive: ['additive', 'additives', 'modifier', 'eluent additive'],
  rf: [
    'rf',
    'rf value',
    'r f',
    'retention factor',
    'target rf',
    'rf target',
    'product rf',
    'rf product',
    'rf of product',
    'tlc rf',
  ],
  rfStartingMaterial: ['rf sm', 'sm rf', 'rf starting material', 'starting material rf', 'rf of starting material'],
  rfOther: [
    'rf impurity',
    'impurity rf',
    'rf by product',
    'by product rf',
    'rf byproduct',
    'byproduct rf',
    'rf side product',
  ],
  stain: [
    'stain',
    'stains',
    'visualisation',
    'visualization',
    'tlc stain',
    'detection',
    'visualised by',
    'visualized by',
    'visualisation method',
    'visualization method',
    'dip',
    'tlc visualisation',
    'tlc visualization',
  ],
  technique: ['technique', 'method', 'chromatography', 'purification', 'purification method', 'type'],
  outcome: ['outcome', 'result', 'separation', 'separation quality', 'purification outcome', 'success'],
  outcomeReason: ['outcome reason', 'failure reason', 'reason for failure', 'outcome note', 'outcome comment'],
  notes: ['notes', 'note', 'comments', 'comment', 'remarks', 'remark', 'observations', 'observation'],
  notebook: [
    'notebook',
    'nb',
    'nb ref',
    'nb page',
    'notebook ref',
    'notebook reference',
    'notebook page',
    'page',
    'eln',
    'eln ref',
    'lab book',
    'labbook',
    'experiment',
    'experiment id',
    'experiment number',
    'exp',
    'ref',
  ],
  yield: ['yield', 'isolated yield', 'yield percent'],
  columnDiameter: ['column diameter', 'diameter', 'column width', 'column id'],
  cartridge: ['cartridge', 'cartridge size', 'column size'],
  silica: ['silica', 'silica mass', 'silica amount', 'amount of silica', 'silica weight'],
  sampleMass: [
    'sample mass',
    'sample mg',
    'sample g',
    'crude',
    'crude mass',
    'load mass',
    'amount loaded',
    'mass loaded',
    'crude weight',
  ],
  loadMethod: ['load', 'loading', 'load method', 'loading method', 'load type'],
  fractionSize: ['fraction size', 'fraction volume', 'fractions size'],
  fractionsPooled: ['fractions pooled', 'pooled fractions', 'pooled', 'fractions combined', 'combined fractions'],
  date: ['date', 'run date', 'date run', 'experiment date', 'when'],
  recordId: ['record id', 'rfolio record id', 'rfolio id', 'record no', 'record number'],
  author: [
    'author',
    'author name',
    'chemist name',
    'chemist',
    'user',
    'operator',
    'researcher',
    'initials',
    'who',
    'by',
    'run by',
    'recorded by',
  ],
};

/** Trailing words that give a unit or a form of amount, dropped before comparing ("Silica (g)", "Yield %", "hexane_fraction"). */
const trailingWords = new Set([
  'mm',
  'cm',
  'mg',
  'g',
  'ml',
  'ul',
  'l',
  'percent',
  'pct',
  'value',
  'fraction',
  'fractions',
  'parts',
  'part',
  'vol',
  'volume',
  'v',
  'vv',
]);

function words(header: string, keepBrackets = false): string[] {
  const folded = header.normalize('NFKD').replace(/\p{M}/gu, '');
  return (keepBrackets ? folded : folded.replace(/\([^)]*\)|\[[^\]]*\]/g, ' '))
    .toLowerCase()
    .split(/[^a-z0-9]+/)
    .filter(Boolean);
}

/** A header folded for comparison: accents, case, brackets, punctuation and spacing ignored ("Rf (product)" → "rf"). */
function headerKey(header: string): string {
  return words(header).join('');
}

function keyWithoutUnits(header: string): string {
  const list = words(header);
  while (list.length > 1 && trailingWords.has(list[list.length - 1])) list.pop();
  return list.join('');
}

const fieldByKey = new Map<string, ImportField>();
for (const [field, names] of Object.entries(headerNames) as [ImportField, readonly string[]][]) {
  for (const name of names) fieldByKey.set(headerKey(name), field);
}

/** Solvents by normalised name, looked up exactly: a header is a solvent's name or not (no fuzzy suggestion, which is slow). */
let solventNames: Map<string, { key: string }> | null = null;
function solventNamed(text: string): { key: string } | undefined {
  solventNames ??= new Map(solventIndex.normalisedNames());
  return solventNames.get(normaliseName(text));
}

/** The target for one header: a field, `solvent:<key>` for a column named after a solvent, or "ignore". */
export function detectTarget(header: string): string {
  const field =
    fieldByKey.get(words(header, true).join('')) ??
    fieldByKey.get(headerKey(header)) ??
    fieldByKey.get(keyWithoutUnits(header));
  if (field) return field;
  const withoutPercent = header.replace(/%|percent/gi, ' ');
  for (const candidate of [
    header,
    withoutPercent,
    words(withoutPercent)
      .filter((word) => !trailingWords.has(word))
      .join(' '),
  ]) {
    const solvent = candidate.trim() ? solventNamed(candidate.trim()) : undefined;
    if (solvent) return `solvent:${solvent.key}`;
  }
  return IGNORE_COLUMN;
}

/**
 * Maps every header to a target automatically; `overrides` (from the user) win. When two headers claim
 * one single-column field, the first keeps it and the later one is ignored, so the mapping stays valid.
 */
export function detectMapping(
  headers: readonly string[],
  overrides: Record<string, string> = {},
): Record<string, string> {
  // Own keys only, and built with fromEntries: a column may be called "constructor" or "__proto__".
  const taken = new Set(Object.values(overrides).filter((target) => target !== IGNORE_COLUMN && target !== 'notes'));
  const entries: [string, string][] = [];
  for (const header of headers) {
    if (Object.hasOwn(overrides, header)) {
      entries.push([header, overrides[header]]);
      continue;
    }
    const target = detectTarget(header);
    if (target !== IGNORE_COLUMN && target !== 'notes' && taken.has(target)) {
      entries.push([header, IGNORE_COLUMN]);
      continue;
    }
    taken.add(target);
    entries.push([header, target]);
  }
  return Object.fromEntries(entries);
}
