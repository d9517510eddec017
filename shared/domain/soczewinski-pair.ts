import { requireSolvent } from '../catalogue/solvents';
import { formatParts } from './format-number';
import { moleFractionFromVolume, partsForVolumeFraction, volumeFractionFromMole } from './mixture-fractions';
import { fitSoczewinski, fractionForRf, predictRf, type SoczewinskiFit } from './soczewinski';

/** Which fraction of the strong solvent the fit uses; Soczewiński's form uses mole fractions (Soczewiński 1969). */
export type FractionBasis = 'mole' | 'volume';

/** One Rf measured in weak : strong = weakParts : strongParts by volume. */
export interface PairMeasurement {
  weakParts: number;
  strongParts: number;
  rf: number;
}

export interface PairFit extends SoczewinskiFit {
  weak: string;
  strong: string;
  basis: FractionBasis;
  /** Measurements without strong solvent (log10 of zero) that the fit could not use. */
  skippedPoints: number;
}

function toBasis(fit: Pick<PairFit, 'weak' | 'strong' | 'basis'>, volumeFraction: number): number {
  return fit.basis === 'mole' ? moleFractionFromVolume(fit.weak, fit.strong, volumeFraction) : volumeFraction;
}

/**
 * Soczewiński fit for one compound in one solvent pair from ratios as a chemist writes them
 * (parts by volume), converted to mole fractions through density and molar mass unless basis is 'volume'.
 */
export function fitPair(
  weak: string,
  strong: string,
  measurements: readonly PairMeasurement[],
  basis: FractionBasis = 'mole',
): PairFit {
  requireSolvent(weak);
  requireSolvent(strong);
  const usable = measurements.filter((point) => point.strongParts > 0 && point.weakParts >= 0);
  const points = usable.map((point) => ({
    fraction: toBasis({ weak, strong, basis }, point.strongParts / (point.weakParts + point.strongParts)),
    rf: point.rf,
  }));
  return { ...fitSoczewinski(points), weak, strong, basis, skippedPoints: measurements.length - usable.length };
}

/** Rf predicted at a volume fraction of the strong solvent (0, 1], flagged when extrapolated. */
export function predictPairRf(fit: PairFit, strongVolumeFraction: number) {
  return predictRf(fit, toBasis(fit, strongVolumeFraction));
}

export interface PairRatio {
  strongVolumeFraction: number;
  /** Parts by volume, weak then strong, the smaller scaled to 1. */
  parts: [number, number];
  /** "weak : strong" as a chemist writes it, e.g. "3.7 : 1". */
  ratio: string;
  rf: number;
  extrapolated: boolean;
  reachable: boolean;
}

/** The weak : strong ratio that the fit says gives a target Rf. */
export function ratioForRf(fit: PairFit, targetRf: number): PairRatio {
  const solution = fractionForRf(fit, targetRf);
  const strongVolumeFraction =
    fit.basis === 'mole' ? volumeFractionFromMole(fit.weak, fit.strong, solution.fraction) : solution.fraction;
  const parts = partsForVolumeFraction(strongVolumeFraction);
  return {
    strongVolumeFraction,
    parts,
    ratio: `${formatParts(parts[0])} : ${formatParts(parts[1])}`,
    rf: solution.rf,
    extrapolated: solution.extrapolated,
    reachable: solution.reachable,
  };
}
