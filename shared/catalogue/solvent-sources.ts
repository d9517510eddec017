import type { SourcedValue } from './types';

/**
 * Provenance strings for solvent data, worded as the team's reference sheet marks them.
 * "Confirmed" values were read in a published text; "from memory" values are recalled handbook
 * values that must be replaced by a confirmed source when one is found.
 * Silica ε° follow the later set (EtOAc 0.48, Et2O 0.43, as in Sadek), not Snyder's older 1968 silica
 * values (EtOAc 0.38, Et2O 0.38).
 */
export const sources = {
  aluminaConfirmed: 'confirmed: published eluotropic series on alumina (Snyder ε°)',
  silicaConfirmed: 'confirmed: P. C. Sadek, Illustrated Pocket Dictionary of Chromatography, p. 74 (Snyder ε° on silica)',
  strengthFromMemory: 'from memory: Snyder ε° eluotropic values, awaiting a confirmed source',
  alkaneMixture: 'from memory: light alkane mixture taken as hexane (ε° 0.01)',
  silicaFromAlumina: 'estimate: 0.77 × the alumina value (Snyder’s approximate silica/alumina ratio, from memory)',
  areaFromMemory: 'from memory: Snyder adsorbed area A_s (n_b), awaiting a confirmed source',
  physicalFromMemory: 'from memory: handbook density (20–25 °C), molar mass and boiling point',
  physicalMixture: 'from memory: typical values for the commercial mixture; grade dependent',
} as const;

export const confirmedAlumina = (value: number): SourcedValue => ({
  value,
  provenance: 'confirmed',
  source: sources.aluminaConfirmed,
});

export const confirmedSilica = (value: number): SourcedValue => ({
  value,
  provenance: 'confirmed',
  source: sources.silicaConfirmed,
});

export const strengthFromMemory = (value: number, range?: readonly [number, number]): SourcedValue => ({
  value,
  provenance: 'from-memory',
  source: range ? `${sources.strengthFromMemory}; published ${range[0]}–${range[1]}, midpoint used` : sources.strengthFromMemory,
  ...(range ? { range } : {}),
});

/** Snyder's rough rule ε°(silica) ≈ 0.77 ε°(alumina), used only where no silica value is known. */
export const silicaFromAlumina = (aluminaValue: number): SourcedValue => ({
  value: Math.round(0.77 * aluminaValue * 100) / 100,
  provenance: 'estimate',
  source: sources.silicaFromAlumina,
});

export const alkaneMixture = (value: number): SourcedValue => ({
  value,
  provenance: 'from-memory',
  source: sources.alkaneMixture,
});

export const areaFromMemory = (value: number): SourcedValue => ({
  value,
  provenance: 'from-memory',
  source: sources.areaFromMemory,
});
