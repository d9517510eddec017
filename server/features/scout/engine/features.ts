import { compoundClassKeys } from '../../../../shared/catalogue/compound-classes';
import type { ScoutDescriptors } from './types';

const elements = ['C', 'H', 'N', 'O', 'S', 'F', 'Cl', 'Br', 'I', 'P', 'Si', 'B'] as const;

/** Element counts read from a Hill formula ("C9H8O4", "C4H12N+"). */
function elementCounts(formula: string): Record<string, number> {
  const counts: Record<string, number> = {};
  for (const [, symbol, count] of formula.matchAll(/([A-Z][a-z]?)(\d*)/g))
    counts[symbol] = (counts[symbol] ?? 0) + (count ? Number(count) : 1);
  return counts;
}

/**
 * Numeric descriptors of a compound for the regression: OpenChemLib's cLogP, TPSA (Å²), donors, acceptors,
 * rotatable bonds, aromatic rings, MW (g/mol), stereocentres and charge, element counts from the formula,
 * heavy atoms, and TPSA and cLogP per heavy atom (polarity density).
 */
export function descriptorVector(descriptors: ScoutDescriptors): number[] {
  const counts = elementCounts(descriptors.formula);
  const heavy = elements.filter((symbol) => symbol !== 'H').reduce((sum, symbol) => sum + (counts[symbol] ?? 0), 0);
  return [
    descriptors.clogp,
    descriptors.tpsa,
    descriptors.hbd,
    descriptors.hba,
    descriptors.rotatableBonds,
    descriptors.aromaticRings,
    descriptors.mw,
    descriptors.stereocentres,
    descriptors.charge,
    ...elements.map((symbol) => counts[symbol] ?? 0),
    heavy,
    descriptors.tpsa / Math.max(heavy, 1),
    descriptors.clogp / Math.max(heavy, 1),
  ];
}

/** 1/0 for each compound class of the catalogue (shared/catalogue/compound-classes.ts), in catalogue order. */
export function classVector(classes: readonly string[]): number[] {
  const present = new Set(classes);
  return compoundClassKeys.map((key) => (present.has(key) ? 1 : 0));
}

/** Column means and standard deviations of a set of vectors; constant columns get sd 1 and so contribute nothing. */
export class Standardiser {
  readonly means: number[];
  readonly sds: number[];

  constructor(rows: readonly number[][]) {
    const width = rows[0]?.length ?? 0;
    this.means = Array.from(
      { length: width },
      (_, column) => rows.reduce((sum, row) => sum + row[column], 0) / Math.max(rows.length, 1),
    );
    this.sds = this.means.map((mean, column) => {
      const variance = rows.reduce((sum, row) => sum + (row[column] - mean) ** 2, 0) / Math.max(rows.length, 1);
      return variance > 1e-12 ? Math.sqrt(variance) : 1;
    });
  }

  /** Standardised values, clipped to ±6 sd so one extreme descriptor cannot dominate a kernel. */
  apply(row: readonly number[]): Float64Array {
    return Float64Array.from(row, (value, column) =>
      Math.max(-6, Math.min(6, (value - this.means[column]) / this.sds[column])),
    );
  }
}
