import { stains } from '../shared/catalogue/stains';
import type { ColumnDetails, Visualisation } from '../shared/schemas/record-parts';
import type { Random } from './demo-rf-model';

const uvClasses = new Set(['aromatic', 'heteroaromatic', 'conjugated']);

/**
 * Visualisations a chemist would plausibly have used, chosen from the stain catalogue by the compound's
 * classes: UV 254 nm for aromatic or conjugated compounds, then a stain whose `detects` list meets the
 * classes (a specific one when there is one), else a general stain.
 */
export function demoVisualisations(classes: readonly string[], random: Random): Visualisation[] {
  const chosen: string[] = [];
  if (classes.some((key) => uvClasses.has(key))) chosen.push('uv-254');
  const meets = (stain: (typeof stains)[number]) =>
    !stain.nonDestructive && stain.detects.some((key) => classes.includes(key));
  const specific = stains.filter((stain) => meets(stain) && stain.selectivity === 'specific');
  const broad = stains.filter((stain) => meets(stain) && stain.selectivity !== 'specific');
  if (specific.length > 0) chosen.push(random.pick(specific).key);
  if (broad.length > 0 && (chosen.length < 2 || random.chance(0.3))) chosen.push(random.pick(broad).key);
  if (chosen.length === 0 || (chosen.length === 1 && chosen[0] === 'uv-254' && random.chance(0.5)))
    chosen.push(random.pick(['pma', 'iodine', 'cam']));
  return [...new Set(chosen)].map((method) => ({ method, note: null }));
}

/**
 * Still, Kahn & Mitra (J. Org. Chem. 1978, 43, 2923, sizing table): column diameter (mm), largest load
 * for ΔRf ≥ 0.2 (mg) and fraction size (mL).
 */
const stillTable = [
  { diameterMm: 10, loadMg: 100, fractionMl: 5 },
  { diameterMm: 20, loadMg: 400, fractionMl: 10 },
  { diameterMm: 30, loadMg: 900, fractionMl: 20 },
  { diameterMm: 40, loadMg: 1600, fractionMl: 30 },
  { diameterMm: 50, loadMg: 2500, fractionMl: 50 },
];

const purityNotes = [
  'clean by ¹H NMR',
  '≥95 % by ¹H NMR',
  'trace grease by ¹H NMR',
  'single spot by TLC',
  'clean by LC-MS',
];

/**
 * Invented flash-column details consistent with Still's table: the narrowest column whose load covers the
 * sample, its fraction size, and silica for a bed of about 15 cm (packed density taken as 0.5 g/mL, an
 * assumption). Cartridge runs name the cartridge instead of a diameter.
 */
export function demoColumn(random: Random, cartridge: boolean): ColumnDetails {
  const sampleMg = Math.round(random.between(60, 1500) / 10) * 10;
  const row = stillTable.find((entry) => entry.loadMg >= sampleMg) ?? stillTable[stillTable.length - 1];
  const silicaG = Math.round(Math.PI * (row.diameterMm / 20) ** 2 * 15 * 0.5);
  const first = Math.round(random.between(4, 12));
  const cartridgeSize = silicaG <= 12 ? '12 g' : silicaG <= 24 ? '24 g' : '40 g';
  return {
    diameterMm: cartridge ? null : row.diameterMm,
    cartridgeSize: cartridge ? cartridgeSize : null,
    silicaG: cartridge ? Number.parseInt(cartridgeSize, 10) : silicaG,
    sampleMg,
    loadMethod: random.chance(0.45) ? 'dry' : 'liquid',
    fractionMl: cartridge ? Math.max(9, row.fractionMl) : row.fractionMl,
    fractionsPooled: `${first}–${first + Math.round(random.between(3, 9))}`,
    yieldPercent: Math.round(random.between(55, 96)),
    purityNote: random.pick(purityNotes),
  };
}
