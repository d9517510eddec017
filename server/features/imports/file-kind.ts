import { UnsupportedMediaTypeError } from '../../http/errors';

export type FileKind = 'csv' | 'sdf';

/** Magic numbers of files people upload by mistake instead of CSV, with what to do instead. */
const refusedSignatures: { bytes: number[]; what: string }[] = [
  { bytes: [0xd0, 0xcf, 0x11, 0xe0], what: 'an old Excel .xls workbook; save it as .xlsx or CSV' },
  { bytes: [0x25, 0x50, 0x44, 0x46], what: 'a PDF document' },
  { bytes: [0x89, 0x50, 0x4e, 0x47], what: 'a PNG image' },
  { bytes: [0xff, 0xd8, 0xff], what: 'a JPEG image' },
  { bytes: [0x1f, 0x8b], what: 'a gzip archive; unpack it first' },
];

const startsWith = (buffer: Buffer, bytes: number[]) => bytes.every((byte, i) => buffer[i] === byte);

/**
 * Decodes an uploaded text file: UTF-8 (with or without BOM), UTF-16 with a BOM (Excel's "Unicode text"),
 * or, when the bytes are not valid UTF-8, Windows-1252 (Excel's "CSV" on Windows). Refuses binary files
 * with 415 and a reason.
 */
export function decodeUpload(buffer: Buffer): string {
  for (const { bytes, what } of refusedSignatures) {
    if (startsWith(buffer, bytes))
      throw new UnsupportedMediaTypeError(
        `The file is ${what}. Upload an .xlsx workbook, CSV (comma, semicolon or tab separated) or SDF.`,
      );
  }
  if (startsWith(buffer, [0xff, 0xfe])) return new TextDecoder('utf-16le').decode(buffer.subarray(2));
  if (startsWith(buffer, [0xfe, 0xff])) return new TextDecoder('utf-16be').decode(buffer.subarray(2));
  const body = startsWith(buffer, [0xef, 0xbb, 0xbf]) ? buffer.subarray(3) : buffer;
  if (body.includes(0))
    throw new UnsupportedMediaTypeError(
      'The file holds binary data, not text. Upload CSV (comma, semicolon or tab separated) or SDF.',
    );
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(body);
  } catch {
    return new TextDecoder('windows-1252').decode(body);
  }
}

/** A molfile counts line ("  5  4  0 … V2000" or "V3000") within the first lines of the text. */
function looksLikeSdf(text: string): boolean {
  const head = text.slice(0, 4_000).split(/\r?\n/, 8);
  return head.some((line) => /V[23]000\s*$/.test(line)) || /^\$\$\$\$\s*$/m.test(text.slice(0, 200_000));
}

/** CSV or SDF, from the content first and the name second; anything else is 415 with the reason. */
export function detectKind(text: string, fileName: string): FileKind {
  const extension = fileName.toLowerCase().match(/\.([a-z0-9]+)$/)?.[1] ?? '';
  if (looksLikeSdf(text)) return 'sdf';
  if (['sdf', 'sd', 'mol'].includes(extension)) {
    throw new UnsupportedMediaTypeError(
      `"${fileName}" is named as SDF but holds no molfile (no V2000/V3000 counts line).`,
    );
  }
  if (text.trim() === '') throw new UnsupportedMediaTypeError('The file is empty.');
  // Title and note lines may stand above the header row; one of the first 40 filled lines must be a table row.
  const lines = text
    .replace(/^\uFEFF/, '')
    .slice(0, 40_000)
    .split(/\r?\n/)
    .filter((line) => line.trim() !== '')
    .slice(0, 40);
  if (!lines.some((line) => /[,;\t]/.test(line))) {
    throw new UnsupportedMediaTypeError(
      'No line holds a comma, semicolon or tab, so this is not a table with headers. Upload CSV (with ' +
        'a header row), an .xlsx workbook or SDF.',
    );
  }
  return 'csv';
}
