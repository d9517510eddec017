import { readDate, type DateOrder } from '../../../shared/domain/import-dates';
import { matchMember, type Member } from '../../../shared/domain/import-people';
import { readPlate, readStains } from '../../../shared/domain/plate-stain-grammar';
import { stationaryPhaseByKey } from '../../../shared/catalogue/stationary-phases';
import type { RecordInput } from '../../../shared/schemas/record';
import type { MappedRow } from './read-row';

/** What a row says beyond the record body: who and when, raw texts kept, the record it was exported from. */
export interface RowFacts {
  /** The sheet's date of the row (ISO yyyy-mm-dd), or null. */
  date: string | null;
  /** The member the person cell names, or null. */
  authorId: number | null;
  /** The person cell as written when no member matched. */
  recordedBy: string | null;
  /** Texts only partly recognised, as written (field → text). */
  sourceTexts: Record<string, string>;
  /** The record id an export of this app carries, when the file has the column. */
  recordId: number | null;
}

/** Facts of the group an import reads rows against. */
export interface RowContext {
  dateOrder: DateOrder | null;
  members: readonly Member[];
}

type Technique = 'tlc' | 'flash' | 'prep_tlc';

/** A group's sheet repeats the same plate and stain texts thousands of times: each distinct text is read once. */
function remembered<A extends unknown[], R>(read: (...args: A) => R, limit = 20_000): (...args: A) => R {
  const known = new Map<string, R>();
  return (...args: A) => {
    const key = JSON.stringify(args);
    let found = known.get(key);
    if (found === undefined) {
      found = read(...args);
      if (known.size >= limit) known.clear();
      known.set(key, found);
    }
    return found;
  };
}

const plateOf = remembered(readPlate);
const stainsOf = remembered(readStains);

/** Reads the plate or column medium; anything unread is a warning, never a rejection. */
export function readPhase(row: MappedRow, technique: Technique, warnings: string[], notes: string[], facts: RowFacts) {
  const written = row.cell('phase');
  const column = `Stationary phase (column "${row.header('phase')}")`;
  if (!written) {
    const key = technique === 'flash' ? 'silica-gel' : 'silica-tlc-f254';
    notes.push(`No stationary phase given: ${stationaryPhaseByKey(key)?.name} assumed.`);
    return { stationaryPhase: key, stationaryPhaseOther: null };
  }
  const plate = plateOf(written, technique);
  if (plate.key === null) {
    facts.sourceTexts.phase = written;
    warnings.push(`${column}: "${written}" is not a phase the catalogue knows; kept as a named "other" phase.`);
    return { stationaryPhase: 'other', stationaryPhaseOther: written.slice(0, 120) };
  }
  if (plate.unrecognised.length > 0) {
    facts.sourceTexts.phase = written;
    warnings.push(
      `${column}: read "${written}" as ${stationaryPhaseByKey(plate.key)?.name}; "${plate.unrecognised.join(' ')}" ` +
        `not recognised (kept as written on the record).`,
    );
  } else if (plate.qualifiers.length > 1 || written.length > 20) facts.sourceTexts.phase = written;
  return { stationaryPhase: plate.key, stationaryPhaseOther: null };
}

/** Reads the visualisations; unrecognised parts are warnings and the whole text stays on the record. */
export function readVisualisation(row: MappedRow, warnings: string[], facts: RowFacts): RecordInput['visualisation'] {
  const written = row.cell('stain');
  if (!written) return [];
  const { items, unrecognised } = stainsOf(written);
  if (unrecognised.length > 0 || items.some((item) => item.note)) facts.sourceTexts.stain = written;
  if (unrecognised.length > 0) {
    const what = unrecognised.map((part) => `"${part}"`).join(', ');
    warnings.push(
      `Visualisation (column "${row.header('stain')}"): ${what} not recognised${items.length ? '; the rest was read' : ''} ` +
        `(kept as written on the record).`,
    );
  }
  if (items.length > 12)
    warnings.push(
      `Visualisation (column "${row.header('stain')}"): only the first 12 of ${items.length} methods are stored.`,
    );
  return items.slice(0, 12).map((item) => (item.note ? { method: item.method, note: item.note } : item.method));
}

/** The row's date and person: a member's record when the person matches one, else "recorded by" text. */
export function readWhoAndWhen(row: MappedRow, context: RowContext, warnings: string[], facts: RowFacts): void {
  const date = row.cell('date');
  if (date) {
    const reading = readDate(date, context.dateOrder);
    if (reading.ok) facts.date = reading.date;
    else {
      facts.sourceTexts.date = date;
      warnings.push(
        `Date (column "${row.header('date')}"): ${reading.reason} The record is dated today; the text is kept on it.`,
      );
    }
  }
  const person = row.cell('author');
  if (person) {
    const member = matchMember(person, context.members);
    if (member) facts.authorId = member.id;
    else facts.recordedBy = person.slice(0, 120);
  }
  const recordId = row.cell('recordId');
  if (recordId && /^\d{1,9}$/.test(recordId)) facts.recordId = Number(recordId);
}
