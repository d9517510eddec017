import { resolveStain } from '../../../shared/catalogue/lookup';
import type { loadMethods, outcomes, techniques } from '../../../shared/schemas/record-parts';

export type CellNumber = { ok: true; value: number | null } | { ok: false; message: string };

/**
 * A number as spreadsheets write it: "0.35", "0,35" (decimal comma), "~0.3", "ca. 0.3", "Rf = 0.3",
 * "85%" or "85 %" (when `percent` is allowed), "1.2e-1". Empty → null. Ranges and words are refused.
 */
export function readNumber(
  cell: string,
  label: string,
  options: { percent?: boolean; prefix?: RegExp } = {},
): CellNumber {
  let text = cell.trim();
  if (text === '') return { ok: true, value: null };
  if (options.prefix) text = text.replace(options.prefix, '').trim();
  text = text.replace(/^(~|≈|ca\.?|approx\.?)\s*/i, '');
  if (options.percent) text = text.replace(/\s*%$/, '');
  if (/^[-+]?\d+,\d+$/.test(text)) text = text.replace(',', '.');
  if (!/^[-+]?(\d+\.?\d*|\.\d+)(e[-+]?\d+)?$/i.test(text))
    return { ok: false, message: `${label} "${cell.trim()}" is not a number.` };
  return { ok: true, value: Number(text) };
}

const outcomeWords: Record<string, (typeof outcomes)[number]> = {
  clean: 'clean',
  pure: 'clean',
  good: 'clean',
  success: 'clean',
  successful: 'clean',
  ok: 'clean',
  yes: 'clean',
  separated: 'clean',
  worked: 'clean',
  fine: 'clean',
  partial: 'partial',
  mixed: 'partial',
  'partly separated': 'partial',
  'partially separated': 'partial',
  'co-elution': 'partial',
  coelution: 'partial',
  overlap: 'partial',
  overlapping: 'partial',
  impure: 'partial',
  'some overlap': 'partial',
  failed: 'failed',
  fail: 'failed',
  failure: 'failed',
  no: 'failed',
  bad: 'failed',
  'no separation': 'failed',
  decomposed: 'failed',
  'not separated': 'failed',
  'did not work': 'failed',
};

const techniqueWords: Record<string, (typeof techniques)[number]> = {
  tlc: 'tlc',
  'thin layer chromatography': 'tlc',
  'thin-layer chromatography': 'tlc',
  plate: 'tlc',
  'analytical tlc': 'tlc',
  flash: 'flash',
  column: 'flash',
  'flash column': 'flash',
  'flash chromatography': 'flash',
  'column chromatography': 'flash',
  'flash column chromatography': 'flash',
  cc: 'flash',
  fcc: 'flash',
  combiflash: 'flash',
  'automated flash': 'flash',
  'prep tlc': 'prep_tlc',
  'preparative tlc': 'prep_tlc',
  ptlc: 'prep_tlc',
  'prep-tlc': 'prep_tlc',
  prep_tlc: 'prep_tlc',
  'prep plate': 'prep_tlc',
  'preparative plate': 'prep_tlc',
};

const loadWords: Record<string, (typeof loadMethods)[number]> = {
  dry: 'dry',
  'dry load': 'dry',
  'dry loaded': 'dry',
  'dry loading': 'dry',
  'dry-load': 'dry',
  'on silica': 'dry',
  'on celite': 'dry',
  celite: 'dry',
  liquid: 'liquid',
  wet: 'liquid',
  'wet load': 'liquid',
  'liquid load': 'liquid',
  'liquid loaded': 'liquid',
  solution: 'liquid',
  'in solution': 'liquid',
  neat: 'liquid',
};

const fold = (cell: string) =>
  cell
    .trim()
    .toLowerCase()
    .replace(/\s+/g, ' ')
    .replace(/[.!]+$/, '');

type Word<T> = { ok: true; value: T | null } | { ok: false; message: string };

function readWord<T>(cell: string, table: Record<string, T>, label: string, allowed: string): Word<T> {
  if (cell.trim() === '') return { ok: true, value: null };
  const value = table[fold(cell)];
  return value
    ? { ok: true, value }
    : { ok: false, message: `Unknown ${label} "${cell.trim()}" (expected ${allowed}).` };
}

/** clean / partial / failed from the words people write ("pure", "mixed", "no separation" …). */
export const readOutcome = (cell: string) => readWord(cell, outcomeWords, 'outcome', 'clean, partial or failed');
/** tlc / flash / prep_tlc from "TLC", "column", "flash chromatography", "prep TLC" … */
export const readTechnique = (cell: string) =>
  readWord(cell, techniqueWords, 'technique', 'TLC, flash column or preparative TLC');
/** dry / liquid loading. */
export const readLoad = (cell: string) => readWord(cell, loadWords, 'load method', 'dry or liquid');

/** How a stain was applied, not what it was: dropped from a visualisation cell ("KMnO4 dip, heat"). */
const applicationWords =
  /\b(stain(ed)?|dip(ped)?|spray(ed)?|heat(ed|ing)?|char(red|ring)?|heat gun|developed|visuali[sz]ed|lamp)\b|\((heat|heated|Δ)\)/gi;

/**
 * Visualisations listed in one cell: "UV, KMnO4", "UV 254 + CAM", "iodine; PMA", "UV and anisaldehyde",
 * "UV 254/365" (two lamps), "KMnO4 dip (heat)". Slashes split between words; words naming how a stain
 * was applied (dip, heat, spray, stain) are dropped unless the stain catalogue knows the whole phrase.
 */
export function splitVisualisations(cell: string): string[] {
  const lamps = cell.replace(
    /\bUV\s*\(?\s*(\d{3})\s*(?:nm)?\s*(?:\/|,|&|and|\+)\s*(\d{3})\s*(?:nm)?\s*\)?/gi,
    'UV $1, UV $2',
  );
  return lamps
    .split(/\s*[,;+&]\s*|\s+and\s+|\s+then\s+|(?<=[A-Za-z])\s*\/\s*(?=[A-Za-z])/i)
    .map((part) =>
      resolveStain(part.trim()).ok ? part.trim() : part.replace(applicationWords, ' ').replace(/\s+/g, ' ').trim(),
    )
    .filter(Boolean);
}
