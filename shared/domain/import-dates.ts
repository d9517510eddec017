/**
 * Dates as a group's sheets carry them: ISO ("2021-03-04"), numeric with the day or the month first
 * ("04/03/2021", "4.3.21", "3-4-2021"), with a month name ("4 Mar 2021", "March 4, 2021"), or a typed date cell
 * (which a workbook reader hands over as ISO). Whether "04/03/2021" is 4 March or 3 April is decided once for
 * the whole column: a cell with a first number above 12 says day first, one with a second number above 12
 * says month first; when no cell decides, the user is asked.
 */

export type DateOrder = 'dmy' | 'mdy';

/** The column's verdict: an order, none needed (no ambiguous cell), undecided (ask), or contradictory (ask). */
export type DateColumnOrder = {
  order: DateOrder | null;
  needsChoice: boolean;
  evidence: { dmy: number; mdy: number; ambiguous: number };
};

const months = ['jan', 'feb', 'mar', 'apr', 'may', 'jun', 'jul', 'aug', 'sep', 'oct', 'nov', 'dec'];

const numeric = /^(\d{1,2})\s*[./-]\s*(\d{1,2})\s*[./-]\s*(\d{2}|\d{4})(?:[ T].*)?$/;
const iso = /^(\d{4})\s*[-./]\s*(\d{1,2})\s*[-./]\s*(\d{1,2})(?:[ T].*)?$/;
const dayMonthName = /^(\d{1,2})(?:st|nd|rd|th)?[\s.-]*([a-z]{3,9})\.?[\s.,-]*(\d{2}|\d{4})$/i;
const monthNameDay = /^([a-z]{3,9})\.?\s+(\d{1,2})(?:st|nd|rd|th)?,?\s+(\d{2}|\d{4})$/i;

function fullYear(text: string, now: Date): number {
  const year = Number(text);
  if (text.length === 4) return year;
  const century = year <= now.getUTCFullYear() % 100 ? 2000 : 1900;
  return century + year;
}

function monthOf(word: string): number | null {
  const index = months.indexOf(word.slice(0, 3).toLowerCase());
  return index < 0 ? null : index + 1;
}

function valid(year: number, month: number, day: number): string | null {
  const date = new Date(Date.UTC(year, month - 1, day));
  if (date.getUTCFullYear() !== year || date.getUTCMonth() !== month - 1 || date.getUTCDate() !== day) return null;
  return `${String(year).padStart(4, '0')}-${String(month).padStart(2, '0')}-${String(day).padStart(2, '0')}`;
}

/** How one cell reads: a date, an ambiguous numeric date (both orders possible), or nothing. */
export function classifyDate(cell: string): 'dmy' | 'mdy' | 'ambiguous' | 'unambiguous' | null {
  const text = cell.trim();
  if (iso.test(text) || dayMonthName.test(text) || monthNameDay.test(text)) return 'unambiguous';
  const match = numeric.exec(text);
  if (!match) return null;
  const [a, b] = [Number(match[1]), Number(match[2])];
  if (a > 12 && b <= 12) return 'dmy';
  if (b > 12 && a <= 12) return 'mdy';
  if (a === b) return 'unambiguous';
  return a <= 12 && b <= 12 ? 'ambiguous' : null;
}

/** Decides the day/month order of a whole column from its cells. */
export function decideDateOrder(cells: readonly string[]): DateColumnOrder {
  const evidence = { dmy: 0, mdy: 0, ambiguous: 0 };
  for (const cell of cells) {
    const kind = classifyDate(cell);
    if (kind === 'dmy' || kind === 'mdy' || kind === 'ambiguous') evidence[kind]++;
  }
  if (evidence.dmy > 0 && evidence.mdy > 0) return { order: null, needsChoice: evidence.ambiguous > 0, evidence };
  if (evidence.dmy > 0) return { order: 'dmy', needsChoice: false, evidence };
  if (evidence.mdy > 0) return { order: 'mdy', needsChoice: false, evidence };
  return { order: null, needsChoice: evidence.ambiguous > 0, evidence };
}

export type DateReading = { ok: true; date: string } | { ok: false; reason: string };

/** One cell as an ISO date (yyyy-mm-dd), with the column's order for numeric dates whose order is unclear. */
export function readDate(cell: string, order: DateOrder | null, now = new Date()): DateReading {
  const text = cell.trim();
  let parts: [number, number, number] | null = null;
  let match = iso.exec(text);
  if (match) parts = [Number(match[1]), Number(match[2]), Number(match[3])];
  else if ((match = dayMonthName.exec(text))) {
    const month = monthOf(match[2]);
    if (month) parts = [fullYear(match[3], now), month, Number(match[1])];
  } else if ((match = monthNameDay.exec(text))) {
    const month = monthOf(match[1]);
    if (month) parts = [fullYear(match[3], now), month, Number(match[2])];
  } else if ((match = numeric.exec(text))) {
    const [a, b] = [Number(match[1]), Number(match[2])];
    const kind = classifyDate(text);
    const use = kind === 'dmy' || kind === 'mdy' ? kind : kind === 'unambiguous' ? 'dmy' : order;
    if (!use)
      return {
        ok: false,
        reason: `"${text}" could be day/month or month/day, and the column does not say which; choose the order.`,
      };
    parts = use === 'dmy' ? [fullYear(match[3], now), b, a] : [fullYear(match[3], now), a, b];
  }
  if (!parts)
    return {
      ok: false,
      reason: `"${text}" is not a date this import reads (e.g. 2021-03-04, 04/03/2021, 4 Mar 2021).`,
    };
  const date = valid(...parts);
  if (!date) return { ok: false, reason: `"${text}" is not a calendar date.` };
  if (parts[0] < 1950 || date > now.toISOString().slice(0, 10))
    return { ok: false, reason: `"${text}" is outside 1950 to today.` };
  return { ok: true, date };
}
