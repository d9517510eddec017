import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { parse } from 'csv-parse/sync';

/** Reads a CSV of the open TLC dataset (Xu et al., Chem 2022, Apache-2.0) in tests/fixtures/open-tlc. */
export function readOpenTlc<T>(fileName: string): T[] {
  const path = fileURLToPath(new URL(`../../fixtures/open-tlc/${fileName}`, import.meta.url));
  return parse(readFileSync(path), { columns: true, skip_empty_lines: true }) as T[];
}

export interface TlcRow {
  smiles: string;
  name: string;
  hexane: string;
  ethyl_acetate: string;
  dichloromethane: string;
  methanol: string;
  diethyl_ether: string;
  rf: string;
}

export interface FlashRow {
  smiles: string;
  name: string;
  petroleum_ether_parts: string;
  ethyl_acetate_parts: string;
  flow_ml_min: string;
  column_silica_g: string;
  band_start_ml: string;
  band_end_ml: string;
}
