import { Molecule } from 'openchemlib';
import { generateLibrary } from './library';

/** Deterministic PRNG (mulberry32), so every run writes the same file. */
function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

/** Eluents a group writes in its sheets, in several notations (parsed by shared/domain/eluent-notation). */
const eluents = [
  'EtOAc/hexanes 1:4',
  'EtOAc/hexanes 1:9',
  'hexane:EtOAc, 3:1',
  '20% EtOAc in hexanes',
  '30% EtOAc/hexanes',
  'DCM/MeOH 9:1',
  'DCM/MeOH 95:5 + 1% Et3N',
  '100% DCM',
  'PE/EtOAc 5:1',
  'Et2O/pentane 1:2',
  'EtOAc',
  'DCM/MeOH 20:1 + 0.5% AcOH',
];
const stains = ['UV', 'UV, KMnO4', 'UV 254', 'CAM', 'p-anisaldehyde', 'ninhydrin', 'iodine', 'UV, PMA'];
const outcomes = ['clean', 'clean', 'clean', 'partial', 'failed'];

/** `count` SMILES of distinct compounds (distinct OpenChemLib ID codes), enumerated from the bench's building blocks. */
export function distinctCompounds(count: number): string[] {
  const seen = new Set<string>();
  const picked: string[] = [];
  for (const smiles of generateLibrary(Math.ceil(count * 1.15), 20_261_209)) {
    const idcode = Molecule.fromSmiles(smiles).getIDCode();
    if (seen.has(idcode)) continue;
    seen.add(idcode);
    picked.push(smiles);
    if (picked.length === count) return picked;
  }
  throw new Error(`Only ${picked.length} distinct compounds; raise the oversampling.`);
}

/**
 * A group's history as a CSV file: `rows` rows over the given compounds, each compound run several times
 * (different eluents and Rf, as a history repeats compounds), rows shuffled like a sheet kept by many people.
 * Generated, not measured: the Rf values are invented.
 */
export function historyCsv(compounds: readonly string[], rows: number, seed = 7): string {
  const random = mulberry32(seed);
  const pick = <T>(list: readonly T[]) => list[Math.floor(random() * list.length)];
  const lines: string[] = [];
  for (let i = 0; i < rows; i++) {
    const compound = i % compounds.length;
    const rf = (0.05 + random() * 0.9).toFixed(2);
    const cells = [
      `compound ${compound + 1}`,
      compounds[compound],
      pick(eluents),
      rf,
      pick(stains),
      `NB-${1000 + Math.floor(i / 20)}-${i % 20}`,
      pick(outcomes),
    ];
    lines.push(cells.map((cell) => (/[",]/.test(cell) ? `"${cell.replace(/"/g, '""')}"` : cell)).join(','));
  }
  for (let i = lines.length - 1; i > 0; i--) {
    const j = Math.floor(random() * (i + 1));
    [lines[i], lines[j]] = [lines[j], lines[i]];
  }
  return ['Compound,SMILES,Eluent,Rf,Stain,Notebook,Outcome', ...lines].join('\n') + '\n';
}
