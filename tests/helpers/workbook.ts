import { strFromU8, strToU8, unzipSync, zipSync } from 'fflate';
import writeExcelFile from 'write-excel-file/node';

export type FixtureCell =
  | string
  | number
  | Date
  | null
  | { value: string | number | Date; type?: unknown; format?: string; columnSpan?: number }
  | { formula: string; cached: number };

/**
 * Builds an .xlsx in memory with write-excel-file (the reader's sibling library), as a spreadsheet program saves
 * one: several sheets, merged cells (columnSpan), typed numbers and dates. A `{ formula, cached }` cell is written
 * as the formula with its cached result, as Excel stores it (write-excel-file writes formulas without a result,
 * so the result is added to the sheet XML afterwards).
 */
export async function buildWorkbook(sheets: { name: string; rows: FixtureCell[][] }[]): Promise<Buffer> {
  const cached: string[] = [];
  const data = sheets.map((sheet) => ({
    sheet: sheet.name,
    data: sheet.rows.map((row) =>
      row.map((cell) => {
        if (cell === null) return null;
        if (cell instanceof Date) return { value: cell, type: Date, format: 'yyyy-mm-dd' };
        if (typeof cell === 'object' && 'formula' in cell) {
          cached.push(String(cell.cached));
          return { value: `=${cell.formula}`, type: 'Formula' };
        }
        if (typeof cell === 'object') return cell;
        return { value: cell };
      }),
    ),
  }));
  const bytes = await writeExcelFile(data as never).toBuffer();
  const files = unzipSync(new Uint8Array(bytes));
  let index = 0;
  for (const name of Object.keys(files).filter((file) => /^xl\/worksheets\/sheet\d+\.xml$/.test(file))) {
    const xml = strFromU8(files[name]).replace(
      /<f>=?([^<]*)<\/f>/g,
      (_match, formula: string) => `<f>${formula}</f><v>${cached[index++]}</v>`,
    );
    files[name] = strToU8(xml);
  }
  return Buffer.from(zipSync(files));
}
