import type { Adsorbent } from '../../../../shared/catalogue/types';
import { anchorTraining, type AnchorTraining } from './anchor-training';
import { adsorbentOf, orderPair, pairKey } from './eluent-position';
import { fitGp, type GpFit } from './gaussian-process';
import { defaultKernelWeights, KernelSpace, type KernelPoint, type KernelWeights } from './kernel';
import { buildPairData, placeMeasurements, type PairData, type PlacedMeasurement } from './pair-data';
import type { KnowledgeSet, ScoutCompound, ScoutMeasurement, ScoutQuery, SolventPair } from './types';

/** 'full': structure (Tanimoto) and descriptors; 'descriptors': descriptors and classes only, for molecules with no close analogue. */
export type ModelVariant = 'full' | 'descriptors';

/** Noise variance λ of one recorded RM relative to the kernel (see kernel.ts for how it was chosen). */
const measurementNoise = 0.2;

export interface AnchorFit {
  training: AnchorTraining;
  gp: GpFit;
}

const variantWeights = (variant: ModelVariant): KernelWeights =>
  variant === 'full' ? defaultKernelWeights : { ...defaultKernelWeights, tanimoto: 0 };

/**
 * The Scout model of one knowledge set: compounds as kernel points, measurements placed on Snyder's ε° scale
 * per adsorbent and pair, and Gaussian-process fits at each pair's anchors, made lazily and kept.
 * Build one per knowledge-set version; it is immutable apart from its caches.
 */
export class ScoutModel {
  readonly compounds: readonly ScoutCompound[];
  readonly measurementsOf: ScoutMeasurement[][];
  readonly space: KernelSpace;
  readonly points: KernelPoint[];
  private readonly positionOf = new Map<number, number>();
  private readonly placed = new Map<Adsorbent, PlacedMeasurement[]>();
  private readonly pairs = new Map<string, PairData>();
  private readonly fits = new Map<string, AnchorFit[]>();
  private readonly kernels = new Map<ModelVariant, Float64Array>();

  constructor(readonly knowledge: KnowledgeSet) {
    this.compounds = knowledge.compounds;
    this.compounds.forEach((compound, index) => this.positionOf.set(compound.id, index));
    this.measurementsOf = this.compounds.map(() => []);
    for (const measurement of knowledge.measurements) {
      const index = this.positionOf.get(measurement.compoundId);
      if (index !== undefined) this.measurementsOf[index].push(measurement);
    }
    this.space = new KernelSpace(this.compounds);
    this.points = this.compounds.map((compound) => this.space.point(compound));
  }

  private reading: number | null = null;

  /**
   * 90 % half-width of the error of reading one plate, in Rf, from the knowledge set's own repeats (the same
   * compound twice in the same phase and eluent): 1.645 × the robust normal scale of one reading, median |ΔRf| ×
   * 1.4826 / √2 (a difference of two readings carries two errors; the median keeps the few wild repeats from
   * setting it). Fewer than 10 repeats: 0.05 (common practice: a spot's centre is read to about ±0.02–0.05; from
   * memory). The 90th percentile of |ΔRf| / √2 (0.185 on the open data) over-covered near the origin and front
   * (0.92–0.97 on the tuning run); this one (≈0.07) covers 0.86–0.87 in every Rf band there.
   */
  get readingError(): number {
    if (this.reading === null) this.reading = repeatReadingError(this.measurementsOf);
    return this.reading;
  }

  indexOf(compoundId: number): number | undefined {
    return this.positionOf.get(compoundId);
  }

  /** Measurements with an Rf placed on the adsorbent's ε° scale. */
  placedOn(adsorbent: Adsorbent): PlacedMeasurement[] {
    let placed = this.placed.get(adsorbent);
    if (!placed) {
      const all = this.measurementsOf.flatMap((list, compound) =>
        list.map((measurement) => ({ compound, measurement })),
      );
      placed = placeMeasurements(all, adsorbent, adsorbentOf);
      this.placed.set(adsorbent, placed);
    }
    return placed;
  }

  /** Every two-solvent pair recorded on the adsorbent (pure-solvent plates join the pairs that contain the solvent). */
  pairsOn(adsorbent: Adsorbent): PairData[] {
    const keys = new Set<string>();
    for (const item of this.placedOn(adsorbent)) if (item.position.kind === 'pair') keys.add(item.position.key);
    return [...keys].map((key) => this.pairData(adsorbent, { weak: key.split('|')[0], strong: key.split('|')[1] }));
  }

  pairData(adsorbent: Adsorbent, pair: SolventPair): PairData {
    const ordered = orderPair(pair.weak, pair.strong, adsorbent) ?? pair;
    const key = `${adsorbent}|${pairKey(ordered)}`;
    let data = this.pairs.get(key);
    if (!data) {
      data = buildPairData(ordered, adsorbent, this.placedOn(adsorbent));
      this.pairs.set(key, data);
    }
    return data;
  }

  /** The kernel between two knowledge compounds (cached as a full matrix for knowledge sets up to 2,500 compounds). */
  kernel(variant: ModelVariant, i: number, j: number): number {
    const n = this.compounds.length;
    if (n > 2500) return this.space.value(this.points[i], this.points[j], variantWeights(variant));
    let matrix = this.kernels.get(variant);
    if (!matrix) {
      matrix = new Float64Array(n * n).fill(Number.NaN);
      this.kernels.set(variant, matrix);
    }
    let value = matrix[i * n + j];
    if (Number.isNaN(value)) {
      value = this.space.value(this.points[i], this.points[j], variantWeights(variant));
      matrix[i * n + j] = value;
      matrix[j * n + i] = value;
    }
    return value;
  }

  /** Gaussian-process fits at the pair's anchors (same order as `data.anchors`). */
  anchorFits(data: PairData, variant: ModelVariant): AnchorFit[] {
    const key = `${variant}|${data.adsorbent}|${data.key}`;
    let fits = this.fits.get(key);
    if (!fits) {
      const others = this.pairsOn(data.adsorbent).filter((other) => other.key !== data.key);
      fits = data.anchors.map((anchor) => {
        const training = anchorTraining(data, anchor, others, this.compounds.length);
        return {
          training,
          gp: fitGp(training.indices, training.y, training.weights, measurementNoise, (i, j) =>
            this.kernel(variant, i, j),
          ),
        };
      });
      this.fits.set(key, fits);
    }
    return fits;
  }

  /** Kernel values of a query against every knowledge compound, and against itself. */
  queryKernel(query: ScoutQuery, variant: ModelVariant): { values: Float64Array; self: number } {
    const point = this.space.point(query);
    const weights = variantWeights(variant);
    return {
      values: Float64Array.from(this.points, (other) => this.space.value(point, other, weights)),
      self: this.space.value(point, point, weights),
    };
  }
}

function repeatReadingError(measurementsOf: readonly ScoutMeasurement[][]): number {
  const differences: number[] = [];
  for (const list of measurementsOf) {
    const byEluent = new Map<string, number[]>();
    for (const item of list) {
      if (item.rf === null || item.mode !== 'isocratic') continue;
      const total = item.components.reduce((sum, part) => sum + part.parts, 0);
      const key = `${item.phase}|${[...item.components]
        .sort((a, b) => a.solvent.localeCompare(b.solvent))
        .map((part) => `${part.solvent}:${(part.parts / total).toFixed(3)}`)
        .join('|')}|${item.additives
        .map((a) => a.additive)
        .sort()
        .join(',')}`;
      byEluent.set(key, [...(byEluent.get(key) ?? []), item.rf]);
    }
    for (const rfs of byEluent.values())
      for (let i = 1; i < rfs.length; i++) differences.push(Math.abs(rfs[i] - rfs[0]));
  }
  if (differences.length < 10) return 0.05;
  differences.sort((a, b) => a - b);
  // Robust normal scale of one reading: median |Δ| · 1.4826 / √2 (MAD estimate), times 1.645 for 90 %.
  return (1.645 * 1.4826 * differences[Math.floor(0.5 * (differences.length - 1))]) / Math.SQRT2;
}
