/** Adsorbents the solvent-strength model (Snyder's ε°) knows about. */
export type Adsorbent = 'silica' | 'alumina';

/**
 * How far a value can be trusted: `confirmed` was read in the published text its `source` names,
 * `from-memory` is a recalled handbook value not yet checked against a published table, `estimate` is computed
 * from other values by a stated rule.
 */
type Provenance = 'confirmed' | 'from-memory' | 'estimate';

/** A number together with where it came from. */
export interface SourcedValue {
  value: number;
  provenance: Provenance;
  source: string;
  /** The span of values (as recalled or published, per `source`) when the catalogue uses their midpoint. */
  range?: readonly [number, number];
}

export type SolventHazard =
  | 'extremely-flammable'
  | 'highly-flammable'
  | 'flammable'
  | 'peroxide-former'
  | 'toxic'
  | 'carcinogen'
  | 'carcinogen-suspect'
  | 'reproductive-toxicant-suspect'
  | 'neurotoxic'
  | 'irritant'
  | 'corrosive'
  | 'ozone-depleting'
  | 'environmental';

/** A replacement that common practice uses for a solvent, e.g. heptane for hexanes. */
export interface GreenerAlternative {
  /** Catalogue keys of the replacement, with parts when it is a premixed blend. */
  solvents: readonly { solvent: string; parts: number }[];
  note: string;
}

export interface Solvent {
  key: string;
  /** Short label for eluent strings, e.g. "EtOAc". */
  label: string;
  name: string;
  /** Names and abbreviations a chemist may write; matched in any case and spacing. */
  synonyms: readonly string[];
  /** Molecular formula; null for mixtures such as petroleum ether. */
  formula: string | null;
  /** g/mL at 20–25 °C. */
  densityGPerMl: number;
  /** g/mol. */
  molarMassGPerMol: number;
  /** °C at 1 atm; for mixtures the middle of `boilingRangeC`. */
  boilingPointC: number;
  boilingRangeC?: readonly [number, number];
  physicalSource: string;
  /** Snyder's solvent strength ε° per adsorbent; null when no value is known. */
  strength: Record<Adsorbent, SourcedValue | null>;
  /** Snyder's adsorbed area n_b (A_s), in units of an aromatic ring carbon's area; null when unknown. */
  adsorbedArea: SourcedValue | null;
  hazards: readonly SolventHazard[];
  hazardNote: string;
  greenerAlternatives: readonly GreenerAlternative[];
}
