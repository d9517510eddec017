/**
 * Rf, RM, retention factor and column volumes.
 * Definitions (textbook definitions, cited as common practice: no single published source is recorded for them;
 * see docs/references.md): Rf = spot distance / front distance; k = (1 − Rf)/Rf; a compound elutes after
 * 1 + k = 1/Rf column volumes. RM = log10((1 − Rf)/Rf) (Bate-Smith & Westall, Biochim. Biophys. Acta 1950;
 * attribution from memory).
 */

const rfOutOfRangeMessage = 'Rf must lie in (0, 1].';

/** Null when Rf (dimensionless) lies in (0, 1], otherwise the reason it does not. */
export function rfProblem(rf: number): string | null {
  if (!Number.isFinite(rf) || rf <= 0 || rf > 1) return `${rfOutOfRangeMessage} Got ${rf}.`;
  return null;
}

function assertRf(rf: number, openAtOne = false): void {
  const problem = rfProblem(rf);
  if (problem) throw new RangeError(problem);
  if (openAtOne && rf === 1) throw new RangeError('RM is not defined at Rf = 1 (the spot ran with the front).');
}

/** RM = log10((1 − Rf)/Rf), dimensionless; Rf in (0, 1). Source: Bate-Smith & Westall (from memory). */
export function rfToRm(rf: number): number {
  assertRf(rf, true);
  return Math.log10((1 - rf) / rf);
}

/** Rf = 1 / (1 + 10^RM), the inverse of rfToRm. */
export function rmToRf(rm: number): number {
  if (!Number.isFinite(rm)) throw new RangeError(`RM must be a finite number. Got ${rm}.`);
  return 1 / (1 + 10 ** rm);
}

/** Retention factor k = (1 − Rf)/Rf, dimensionless (textbook definition; common practice). */
export function retentionFactor(rf: number): number {
  assertRf(rf);
  return (1 - rf) / rf;
}

/** Column volumes to elution, CV = 1 + k = 1/Rf (textbook relation; common practice). */
export function columnVolumes(rf: number): number {
  assertRf(rf);
  return 1 / rf;
}

/** ΔCV = |1/Rf₁ − 1/Rf₂|, column volumes between two bands (common practice). */
export function deltaColumnVolumes(rfA: number, rfB: number): number {
  return Math.abs(columnVolumes(rfA) - columnVolumes(rfB));
}

export type RfFromDistances =
  | { ok: true; rf: number }
  | {
      ok: false;
      code: 'front-not-positive' | 'spot-negative' | 'spot-beyond-front' | 'rf-out-of-range';
      message: string;
    };

/**
 * Rf from distances measured on the plate, both in mm from the origin:
 * Rf = spot / front (the definition of Rf; common practice). Refuses a spot beyond the front and Rf outside (0, 1].
 */
export function rfFromDistances(spotMm: number, frontMm: number): RfFromDistances {
  if (!Number.isFinite(frontMm) || frontMm <= 0) {
    return {
      ok: false,
      code: 'front-not-positive',
      message: 'The solvent front must be a positive distance from the origin.',
    };
  }
  if (!Number.isFinite(spotMm) || spotMm < 0) {
    return {
      ok: false,
      code: 'spot-negative',
      message: 'The spot distance must be zero or more millimetres from the origin.',
    };
  }
  if (spotMm > frontMm) {
    return {
      ok: false,
      code: 'spot-beyond-front',
      message: `The spot (${spotMm} mm) lies beyond the solvent front (${frontMm} mm).`,
    };
  }
  const rf = spotMm / frontMm;
  const problem = rfProblem(rf);
  if (problem) return { ok: false, code: 'rf-out-of-range', message: `${problem} A spot on the origin did not move.` };
  return { ok: true, rf };
}
