import { popcount32 } from '../../../chem/similarity-index';
import { polarGroupCountsOfSmiles } from '../../../chem/polar-groups';
import { classVector, descriptorVector, Standardiser } from './features';
import type { ScoutDescriptors } from './types';

/** What the kernel needs of one compound, prepared once per knowledge set. */
export interface KernelPoint {
  fingerprint: Int32Array;
  bits: number;
  descriptors: Float64Array;
  classes: Float64Array;
}

/**
 * Weights of the compound kernel's parts. Tanimoto on OpenChemLib fingerprints (Willett 1998) carries
 * structural analogy; linear kernels on standardised descriptors and class flags carry additive polarity
 * contributions (the additivity of RM over groups, Martin's rule, from memory); a Gaussian kernel on the
 * descriptors lets that relation bend; a constant carries the intercept. Values chosen by leave-one-compound-out
 * runs on the open TLC data (Xu et al., Chem 2022) — see tests/bench/eval-scout.ts.
 */
export interface KernelWeights {
  tanimoto: number;
  descriptors: number;
  classes: number;
  gaussian: number;
  constant: number;
}

export const defaultKernelWeights: KernelWeights = {
  tanimoto: 1,
  descriptors: 1,
  classes: 0.5,
  gaussian: 0.5,
  constant: 1,
};

/** Tanimoto coefficient of two 512-bit fingerprints (16 int32): common bits / bits in either. */
export function tanimoto(a: Int32Array, aBits: number, b: Int32Array, bBits: number): number {
  let common = 0;
  for (let w = 0; w < 16; w++) common += popcount32(a[w] & b[w]);
  const union = aBits + bBits - common;
  return union === 0 ? 0 : common / union;
}

function bitCount(words: Int32Array): number {
  let sum = 0;
  for (let w = 0; w < 16; w++) sum += popcount32(words[w]);
  return sum;
}

interface KernelInput {
  smiles: string;
  descriptors: ScoutDescriptors;
  classes: readonly string[];
}

/** Descriptors (features.ts) followed by the polar group counts (server/chem/polar-groups.ts). */
const numericFeatures = (compound: KernelInput) => [
  ...descriptorVector(compound.descriptors),
  ...polarGroupCountsOfSmiles(compound.smiles),
];

/** Prepares kernel points with standardisers fitted on the knowledge set's compounds. */
export class KernelSpace {
  private readonly descriptorScale: Standardiser;
  private readonly classScale: Standardiser;

  constructor(
    compounds: readonly KernelInput[],
    readonly weights: KernelWeights = defaultKernelWeights,
  ) {
    this.descriptorScale = new Standardiser(compounds.map(numericFeatures));
    this.classScale = new Standardiser(compounds.map((compound) => classVector(compound.classes)));
  }

  point(compound: KernelInput & { fingerprint: ArrayLike<number> }): KernelPoint {
    const fingerprint = Int32Array.from(compound.fingerprint, (word) => word | 0);
    return {
      fingerprint,
      bits: bitCount(fingerprint),
      descriptors: this.descriptorScale.apply(numericFeatures(compound)),
      classes: this.classScale.apply(classVector(compound.classes)),
    };
  }

  /** k(a, b): the weighted sum of Tanimoto, linear, Gaussian and constant parts. */
  value(a: KernelPoint, b: KernelPoint, weights: KernelWeights = this.weights): number {
    let linear = 0;
    let distance = 0;
    const dimension = a.descriptors.length;
    for (let i = 0; i < dimension; i++) {
      linear += a.descriptors[i] * b.descriptors[i];
      distance += (a.descriptors[i] - b.descriptors[i]) ** 2;
    }
    let classes = 0;
    for (let i = 0; i < a.classes.length; i++) classes += a.classes[i] * b.classes[i];
    return (
      weights.constant +
      (weights.tanimoto ? weights.tanimoto * tanimoto(a.fingerprint, a.bits, b.fingerprint, b.bits) : 0) +
      (weights.descriptors * linear) / dimension +
      (weights.classes * classes) / a.classes.length +
      weights.gaussian * Math.exp((-0.5 * distance) / dimension)
    );
  }
}
