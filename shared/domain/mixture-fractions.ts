import { requireSolvent } from '../catalogue/solvents';

/** One solvent of an eluent with its parts by volume (any unit; only ratios matter). */
export interface MixturePart {
  solvent: string;
  parts: number;
}

export interface MixtureFractions {
  solvent: string;
  volumeFraction: number;
  moleFraction: number;
}

function checkParts(mixture: readonly MixturePart[]): number {
  if (mixture.length === 0) throw new RangeError('An eluent needs at least one solvent.');
  let total = 0;
  for (const { solvent, parts } of mixture) {
    if (!Number.isFinite(parts) || parts < 0) throw new RangeError(`Parts of ${solvent} must be zero or more.`);
    total += parts;
  }
  if (total <= 0) throw new RangeError('The parts of an eluent must add up to more than zero.');
  return total;
}

/**
 * Volume fractions and mole fractions of a mixture given in parts by volume.
 * n_i = V_i·ρ_i/M_i with ρ in g/mL and M in g/mol from the solvent catalogue (handbook values, from memory);
 * volumes are taken as additive (no volume change on mixing), the usual approximation.
 */
export function mixtureFractions(mixture: readonly MixturePart[]): MixtureFractions[] {
  const total = checkParts(mixture);
  const moles = mixture.map(({ solvent, parts }) => {
    const { densityGPerMl, molarMassGPerMol } = requireSolvent(solvent);
    return (parts / total) * (densityGPerMl / molarMassGPerMol);
  });
  const totalMoles = moles.reduce((sum, value) => sum + value, 0);
  return mixture.map(({ solvent, parts }, index) => ({
    solvent,
    volumeFraction: parts / total,
    moleFraction: moles[index] / totalMoles,
  }));
}

/** Mole fraction of `strong` in a two-solvent mixture holding volume fraction φ of it (same approximation). */
export function moleFractionFromVolume(weak: string, strong: string, volumeFraction: number): number {
  if (volumeFraction <= 0) return 0;
  if (volumeFraction >= 1) return 1;
  return mixtureFractions([
    { solvent: weak, parts: 1 - volumeFraction },
    { solvent: strong, parts: volumeFraction },
  ])[1].moleFraction;
}

/** Volume fraction of `strong` in a two-solvent mixture holding mole fraction x of it; inverse of moleFractionFromVolume. */
export function volumeFractionFromMole(weak: string, strong: string, moleFraction: number): number {
  if (moleFraction <= 0) return 0;
  if (moleFraction >= 1) return 1;
  const molarVolume = (key: string) => {
    const { densityGPerMl, molarMassGPerMol } = requireSolvent(key);
    return molarMassGPerMol / densityGPerMl;
  };
  const strongVolume = moleFraction * molarVolume(strong);
  return strongVolume / (strongVolume + (1 - moleFraction) * molarVolume(weak));
}

/** "a : b" parts for a volume fraction φ of the second solvent, scaled so the smaller part is 1 (e.g. 0.2 → [4, 1]). */
export function partsForVolumeFraction(volumeFraction: number): [number, number] {
  if (volumeFraction <= 0) return [1, 0];
  if (volumeFraction >= 1) return [0, 1];
  const weak = 1 - volumeFraction;
  const smaller = Math.min(weak, volumeFraction);
  return [weak / smaller, volumeFraction / smaller];
}
