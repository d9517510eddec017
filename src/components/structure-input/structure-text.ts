/** True for MDL molfile / SDF text (a V2000 or V3000 counts line, or an `M  END` line). */
export function looksLikeMolfile(text: string): boolean {
  return /V[23]000/.test(text) || /^M {2}END/m.test(text);
}

/**
 * The text to send for parsing: a SMILES is trimmed; a molfile is kept as is, because its first
 * three lines are a header that may be blank and whose position matters.
 */
export function structureToSend(text: string): string {
  return looksLikeMolfile(text) ? text : text.trim();
}

/** The first record of an SDF (text up to the first `$$$$` line) and whether more records follow. */
export function firstSdfRecord(text: string): { record: string; more: boolean } {
  const match = /^\${4}[^\S\n]*\r?$/m.exec(text);
  if (!match) return { record: text, more: false };
  const record = text.slice(0, match.index);
  const rest = text.slice(match.index + match[0].length);
  return { record, more: /\S/.test(rest) };
}

/** The first SMILES of a .smi file: first non-blank line, first field (a name may follow). */
export function firstSmiles(text: string): string {
  const line = text.split(/\r?\n/).find((l) => l.trim() && !l.trim().startsWith('#')) ?? '';
  return line.trim().split(/\s+/)[0] ?? '';
}

/** Reading stops here: the first record of any sensible file fits, and the server refuses far less (20 kB). */
const READ_LIMIT = 1_000_000;

export interface FileStructure {
  text: string;
  /** Said to the user, e.g. "First of several records in batch.sdf". */
  note: string;
}

/** Reads a dropped or chosen .mol, .sdf or .smi file as text and keeps its first structure (an SDF record keeps its data items). */
export async function readStructureFile(file: File): Promise<FileStructure> {
  const text = await file.slice(0, READ_LIMIT).text();
  if (!looksLikeMolfile(text)) {
    return { text: firstSmiles(text), note: `SMILES read from ${file.name}` };
  }
  const { record, more } = firstSdfRecord(text);
  const truncated = file.size > READ_LIMIT;
  return {
    text: record,
    note: more || truncated ? `First record of ${file.name} used; the file holds more` : `Read from ${file.name}`,
  };
}
