/** One data row of an uploaded file, with its original cells keyed by (unique) header. */
export interface SourceRow {
  /** 1-based number among the data rows (blank rows not counted). */
  row: number;
  /** 1-based line of the file where the row (or SDF record) starts. */
  line: number;
  values: Record<string, string>;
  /** Non-empty cells beyond the last header, which no column can hold. */
  extraCells: string[];
}

/** An uploaded file opened for import: its headers, row count, and its rows read as a stream. */
export interface ImportSource {
  kind: 'csv' | 'sdf' | 'xlsx';
  delimiter: string | null;
  headers: string[];
  /** Data rows (blank rows excluded). */
  total: number;
  /** Rows whose every cell was empty; they carry nothing and are only counted. */
  blankRows: number;
  /** Rows after the given row number, in order. */
  rows(after?: number): AsyncGenerator<SourceRow>;
  /** Line (CSV) or sheet row (workbook) of the header row; 0 for SDF. */
  headerRow: number;
  /** The workbook sheet read (null for CSV and SDF) and every sheet of the workbook. */
  sheet: string | null;
  sheets: string[];
  /** Filled rows above the header row (titles, notes), shortened, for the preview. */
  titleRows: string[];
}

/** Headers made usable as keys: trimmed, an empty one named "column N", a repeated one numbered "Rf (2)". */
export function uniqueHeaders(raw: readonly string[]): string[] {
  const seen = new Map<string, number>();
  return raw.map((header, index) => {
    const base = header.trim() || `column ${index + 1}`;
    const count = (seen.get(base.toLowerCase()) ?? 0) + 1;
    seen.set(base.toLowerCase(), count);
    return count === 1 ? base : `${base} (${count})`;
  });
}
