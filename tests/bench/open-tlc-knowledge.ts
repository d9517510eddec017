import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { parse } from 'csv-parse/sync';
import { analyseStructure, fingerprintMolecule } from '../../server/chem';
import type { KnowledgeSet, ScoutCompound, ScoutMeasurement } from '../../server/features/scout/engine/types';

/**
 * Turns a CSV of the open TLC data (Xu et al., "High-throughput discovery of chemical structure-polarity
 * relationships combining automation and machine learning techniques", Chem 2022; Apache-2.0;
 * tests/fixtures/open-tlc) into the knowledge set the Scout engine reads — the same objects the API builds
 * from condition records. Compounds are identified by OpenChemLib ID code, so two spellings of one structure
 * are one compound. Rf values outside 0–1 are clamped, as the data's README asks.
 */

export const openTlcColumns = [
  ['hexane', 'hexanes'],
  ['ethyl_acetate', 'ethyl-acetate'],
  ['dichloromethane', 'dichloromethane'],
  ['methanol', 'methanol'],
  ['diethyl_ether', 'diethyl-ether'],
] as const;

type Row = Record<(typeof openTlcColumns)[number][0] | 'smiles' | 'name' | 'rf', string>;

interface Analysed {
  idcode: string;
  smiles: string;
  descriptors: ScoutCompound['descriptors'];
  classes: string[];
  fingerprint: number[];
}

const cachePath = resolve('.cache/scout/open-tlc-structures.json');
const oclVersion = (
  JSON.parse(readFileSync(resolve('node_modules/openchemlib/package.json'), 'utf8')) as { version: string }
).version;

/** Descriptors, classes and fingerprints of each SMILES, computed with server/chem once and cached in .cache/. */
export function analyseSmiles(smiles: readonly string[]): Map<string, Analysed> {
  const cache: { version: string; entries: Record<string, Analysed> } = existsSync(cachePath)
    ? JSON.parse(readFileSync(cachePath, 'utf8'))
    : { version: oclVersion, entries: {} };
  if (cache.version !== oclVersion) Object.assign(cache, { version: oclVersion, entries: {} });
  let changed = false;
  for (const text of smiles) {
    if (cache.entries[text]) continue;
    const analysis = analyseStructure(text);
    cache.entries[text] = {
      idcode: analysis.identity.idcode,
      smiles: analysis.identity.canonicalSmiles,
      descriptors: analysis.descriptors,
      classes: analysis.classes,
      fingerprint: Array.from(fingerprintMolecule(analysis.parent)),
    };
    changed = true;
  }
  if (changed) {
    mkdirSync(dirname(cachePath), { recursive: true });
    writeFileSync(cachePath, JSON.stringify(cache));
  }
  return new Map(smiles.map((text) => [text, cache.entries[text]]));
}

/** The eluent of a row as parts by volume (the CSV gives volume fractions). */
export function componentsOf(row: Row): { solvent: string; parts: number }[] {
  return openTlcColumns
    .map(([column, solvent]) => ({ solvent, parts: Number(row[column]) }))
    .filter((part) => part.parts > 0);
}

/** Reads a CSV with the columns of tlc-rf.csv into a knowledge set (phase: silica TLC plates); ids count from `idBase` + 1. */
export function openTlcKnowledge(path: string, idBase = 0): KnowledgeSet {
  return knowledgeOfRows(parse(readFileSync(path), { columns: true, skip_empty_lines: true }) as Row[], path, idBase);
}

function knowledgeOfRows(rows: Row[], path: string, idBase: number): KnowledgeSet {
  const analysed = analyseSmiles([...new Set(rows.map((row) => row.smiles))]);
  const ids = new Map<string, number>();
  const compounds: ScoutCompound[] = [];
  const measurements: ScoutMeasurement[] = [];
  for (const row of rows) {
    const structure = analysed.get(row.smiles) as Analysed;
    let id = ids.get(structure.idcode);
    if (id === undefined) {
      id = idBase + compounds.length + 1;
      ids.set(structure.idcode, id);
      compounds.push({
        id,
        name: row.name || null,
        smiles: structure.smiles,
        descriptors: structure.descriptors,
        classes: structure.classes,
        fingerprint: structure.fingerprint,
      });
    }
    measurements.push({
      recordId: null,
      compoundId: id,
      phase: 'silica-tlc-f254',
      components: componentsOf(row),
      additives: [],
      mode: 'isocratic',
      rf: Math.min(1, Math.max(0, Number(row.rf))),
      outcome: 'clean',
      outcomeReason: null,
      visualisations: [],
      demo: false,
    });
  }
  return { version: `open-tlc:${path}:${rows.length}`, compounds, measurements };
}

/** The knowledge set without one compound (a leave-one-compound-out fold). */
export function withoutCompound(knowledge: KnowledgeSet, compoundId: number): KnowledgeSet {
  return {
    version: `${knowledge.version}-without-${compoundId}`,
    compounds: knowledge.compounds.filter((compound) => compound.id !== compoundId),
    measurements: knowledge.measurements.filter((measurement) => measurement.compoundId !== compoundId),
  };
}

/**
 * The fixed compound split of the Scout README: distinct SMILES of the file numbered from 0 in file order, those
 * with number mod 4 = 3 form the test part. Returns [training, test] knowledge sets (test ids from 1,000,001).
 */
export function fixedSplit(path: string): [KnowledgeSet, KnowledgeSet] {
  const rows = parse(readFileSync(path), { columns: true, skip_empty_lines: true }) as Row[];
  const order = new Map<string, number>();
  for (const row of rows) if (!order.has(row.smiles)) order.set(row.smiles, order.size);
  const isTest = (row: Row) => (order.get(row.smiles) as number) % 4 === 3;
  return [
    knowledgeOfRows(
      rows.filter((row) => !isTest(row)),
      `${path}:train`,
      0,
    ),
    knowledgeOfRows(rows.filter(isTest), `${path}:test`, 1_000_000),
  ];
}
