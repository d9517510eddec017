/**
 * Source of the flash-column sizing table: W. C. Still, M. Kahn, A. Mitra, "Rapid chromatographic technique for
 * preparative separations with moderate resolution", J. Org. Chem. 1978, 43, 2923–2925, the sizing table.
 */
export const stillSource = 'Still, Kahn & Mitra, J. Org. Chem. 1978, 43, 2923, sizing table';

export interface StillRow {
  /** Column diameter, mm. */
  diameterMm: number;
  /** Eluent for packing and elution, mL. */
  eluentMl: number;
  /** Typical sample load when ΔRf ≥ 0.2, mg. */
  loadMgAtDeltaRf02: number;
  /** Typical sample load when ΔRf ≥ 0.1, mg. */
  loadMgAtDeltaRf01: number;
  /** Fraction size, mL. */
  fractionMl: number;
}

/** The sizing table of Still, Kahn & Mitra (J. Org. Chem. 1978, 43, 2923), bed about 15 cm of 40–63 µm silica. */
export const stillTable: readonly StillRow[] = [
  { diameterMm: 10, eluentMl: 100, loadMgAtDeltaRf02: 100, loadMgAtDeltaRf01: 40, fractionMl: 5 },
  { diameterMm: 20, eluentMl: 200, loadMgAtDeltaRf02: 400, loadMgAtDeltaRf01: 160, fractionMl: 10 },
  { diameterMm: 30, eluentMl: 400, loadMgAtDeltaRf02: 900, loadMgAtDeltaRf01: 360, fractionMl: 20 },
  { diameterMm: 40, eluentMl: 600, loadMgAtDeltaRf02: 1600, loadMgAtDeltaRf01: 600, fractionMl: 30 },
  { diameterMm: 50, eluentMl: 1000, loadMgAtDeltaRf02: 2500, loadMgAtDeltaRf01: 1000, fractionMl: 50 },
];

export type LoadColumn = 'deltaRf02' | 'deltaRf01';

export interface TableSize {
  diameterMm: number;
  eluentMl: number;
  fractionMl: number;
  /** Where the numbers sit relative to the table. */
  position: 'row' | 'between-rows' | 'below-table' | 'above-table';
  /** The smallest table diameter that takes the load, or null above the table. */
  tableDiameterMm: number | null;
  source: string;
}

const loadOf = (row: StillRow, column: LoadColumn) =>
  column === 'deltaRf02' ? row.loadMgAtDeltaRf02 : row.loadMgAtDeltaRf01;

/**
 * Column diameter, eluent volume and fraction size for a sample mass (mg) from Still's table: a row exactly,
 * linear interpolation in load between neighbouring rows, the smallest row below the table, and above it a
 * scale-up at constant bed height (diameter ∝ √load, volumes ∝ cross-section; common practice, not in the table).
 */
export function sizeFromTable(sampleMg: number, column: LoadColumn): TableSize {
  const first = stillTable[0];
  const last = stillTable[stillTable.length - 1];
  if (sampleMg <= loadOf(first, column)) {
    const position = sampleMg < loadOf(first, column) ? 'below-table' : 'row';
    return {
      ...pick(first),
      position,
      tableDiameterMm: first.diameterMm,
      source: `${stillSource}, ${first.diameterMm} mm row (smallest in the table)`,
    };
  }
  for (let index = 1; index < stillTable.length; index += 1) {
    const lower = stillTable[index - 1];
    const upper = stillTable[index];
    if (sampleMg > loadOf(upper, column)) continue;
    const t = (sampleMg - loadOf(lower, column)) / (loadOf(upper, column) - loadOf(lower, column));
    if (t === 1)
      return {
        ...pick(upper),
        position: 'row',
        tableDiameterMm: upper.diameterMm,
        source: `${stillSource}, ${upper.diameterMm} mm row`,
      };
    const mix = (key: 'diameterMm' | 'eluentMl' | 'fractionMl') => lower[key] + t * (upper[key] - lower[key]);
    return {
      diameterMm: mix('diameterMm'),
      eluentMl: mix('eluentMl'),
      fractionMl: mix('fractionMl'),
      position: 'between-rows',
      tableDiameterMm: upper.diameterMm,
      source: `${stillSource}, interpolated linearly between the ${lower.diameterMm} and ${upper.diameterMm} mm rows`,
    };
  }
  const area = sampleMg / loadOf(last, column);
  return {
    diameterMm: last.diameterMm * Math.sqrt(area),
    eluentMl: last.eluentMl * area,
    fractionMl: last.fractionMl * area,
    position: 'above-table',
    tableDiameterMm: null,
    source:
      `extrapolated from the ${last.diameterMm} mm row of ${stillSource} by cross-section area ` +
      `at the same bed height (common practice; outside the table)`,
  };
}

const pick = (row: StillRow) => ({ diameterMm: row.diameterMm, eluentMl: row.eluentMl, fractionMl: row.fractionMl });
