import { distinctCompounds, historyCsv } from './tests/bench/import-history';
import { openCsv } from './server/services/imports/csv-source';
import { detectMapping } from './shared/domain/import-headers';
import { readRow, MappedRow } from './server/services/imports/read-row';
import { validateRow } from './server/services/imports/validate-row';
import { StructureCache } from './server/services/imports/prepare-row';
let t0 = performance.now();
const csv = historyCsv(distinctCompounds(500), 2000);
console.log('gen', (performance.now()-t0).toFixed(0));
t0 = performance.now();
const src = await openCsv(csv); const mapping = detectMapping(src.headers);
console.log('open', (performance.now()-t0).toFixed(0));
const t: Record<string, number> = { read: 0, validate: 0, analyse: 0, iterate: 0 };
const cache = new StructureCache();
let last = performance.now();
for await (const row of src.rows()) {
  let s = performance.now(); t.iterate += s - last;
  const r = readRow(row, mapping, 'csv'); t.read += performance.now() - s; s = performance.now();
  if (r.ok) validateRow(r.input, new MappedRow(row, mapping)); t.validate += performance.now() - s; s = performance.now();
  cache.analyse(row.values.SMILES); t.analyse += performance.now() - s;
  last = performance.now();
}
console.log(Object.fromEntries(Object.entries(t).map(([k, v]) => [k, v.toFixed(0)])));
