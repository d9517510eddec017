import { IGNORE_COLUMN } from '../schemas/import';
import { detectTarget } from './import-headers';

/** Rows looked at for the header row (a notes block or a title above the table is rarely longer). */
const HEADER_SEARCH_ROWS = 40;

const essential = new Set(['structure', 'rf', 'eluent']);

/**
 * How much a row looks like the table's header row: one point per cell that names a column the import knows,
 * three more per essential column (structure, Rf, eluent or a solvent's amount); a row of one filled cell (a
 * title, a merged group header) or of numbers scores nothing.
 */
export function headerScore(cells: readonly string[]): number {
  const filled = cells.map((cell) => cell.trim()).filter(Boolean);
  if (filled.length < 2 || filled.length > 200) return 0;
  let score = 0;
  const seen = new Set<string>();
  for (const cell of filled) {
    if (cell.length > 60 || /^[-+\d.,\s%~]+$/.test(cell)) continue;
    const target = detectTarget(cell);
    if (target === IGNORE_COLUMN) continue;
    const field = target.startsWith('solvent:') ? 'eluent' : target;
    score += 1 + (essential.has(field) && !seen.has(field) ? 3 : 0);
    seen.add(field);
  }
  return score;
}

/** The 0-based index of the row that looks most like the header among the first rows (the first filled row when none does). */
export function detectHeaderRow(rows: readonly (readonly string[])[]): { index: number; score: number } {
  let best = { index: -1, score: 0 };
  for (let index = 0; index < Math.min(rows.length, HEADER_SEARCH_ROWS); index++) {
    const score = headerScore(rows[index]);
    if (score > best.score) best = { index, score };
  }
  if (best.index >= 0) return best;
  const first = rows.findIndex((row) => row.some((cell) => cell.trim() !== ''));
  return { index: Math.max(0, first), score: 0 };
}
