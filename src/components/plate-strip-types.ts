import type { spotRoles } from '../../shared/schemas/record-parts';

/** A spot's role, as records store it: the target is amber, starting material hollow, the rest ink. */
export type SpotRole = (typeof spotRoles)[number];

export interface PlateSpot {
  rf: number;
  role: SpotRole;
  /** The spot's own label, for the description (e.g. "Boc-amine"). */
  note?: string;
}

/** Scout's expected spot: the estimate with its interval (both Rf). */
interface PredictedSpot {
  rf: number;
  low?: number;
  high?: number;
}

export interface PlateLane {
  /** Short label drawn under the lane in the large size (e.g. the eluent "hexane/EtOAc 4:1"). */
  label?: string;
  spots: PlateSpot[];
  predicted?: PredictedSpot;
  /** Rf of the neighbours' target spots, drawn faintly beside the predicted spot. */
  neighbours?: number[];
}
