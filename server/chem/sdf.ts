/** One record of an SD file as text: the molfile part and its data fields. */
export interface SdfRecordText {
  /** 1-based record number. */
  index: number;
  /** 1-based line where the record starts in the whole file. */
  line: number;
  molfile: string;
  fields: Record<string, string>;
}

const FIELD_HEADER = /^>.*<([^>]+)>/;

function readFields(lines: string[]): Record<string, string> {
  const fields: Record<string, string> = {};
  let name: string | null = null;
  let value: string[] = [];
  const flush = () => {
    // defineProperty, so a data item called "__proto__" is kept like any other.
    if (name !== null)
      Object.defineProperty(fields, name, {
        value: value.join('\n').trim(),
        enumerable: true,
        writable: true,
        configurable: true,
      });
    name = null;
    value = [];
  };
  for (const line of lines) {
    const header = FIELD_HEADER.exec(line);
    if (header) {
      flush();
      name = header[1].trim();
    } else if (name !== null) {
      if (line.trim() === '') flush();
      else value.push(line);
    }
  }
  flush();
  return fields;
}

/**
 * Splits SD file text (MDL CTfile format: molfile, "M  END", data items `> <NAME>` each followed
 * by value lines and a blank line, records ended by `$$$$`) into records. Blank trailing records
 * are dropped; a last record without `$$$$` is kept.
 */
export function splitSdf(text: string): SdfRecordText[] {
  const lines = text.split(/\r?\n/);
  const records: SdfRecordText[] = [];
  let start = 0;
  const push = (end: number) => {
    const chunk = lines.slice(start, end);
    if (chunk.every((line) => line.trim() === '')) return;
    const endIndex = chunk.findIndex((line) => line.startsWith('M  END'));
    const molfileLines = endIndex >= 0 ? chunk.slice(0, endIndex + 1) : chunk;
    const fieldLines = endIndex >= 0 ? chunk.slice(endIndex + 1) : [];
    records.push({
      index: records.length + 1,
      line: start + 1,
      molfile: `${molfileLines.join('\n')}\n`,
      fields: readFields(fieldLines),
    });
  };
  lines.forEach((line, i) => {
    if (line.startsWith('$$$$')) {
      push(i);
      start = i + 1;
    }
  });
  push(lines.length);
  return records;
}
