import type { SourcedValue } from './types';

/**
 * Source strings for solvent data, shown beside each value in the app and worded as a reader would cite them
 * (full citations in docs/references.md). Provenance `confirmed` values were read in the published text named;
 * "from memory" values are recalled handbook values to be replaced when a published table is checked.
 * Alumina ε°: Snyder's eluotropic series (L. R. Snyder, Principles of Adsorption Chromatography, 1968).
 * Silica ε°: the later set (EtOAc 0.48, Et2O 0.43) in P. C. Sadek, The Illustrated Pocket Dictionary of
 * Chromatography, p. 74, not Snyder's older 1968 silica values (EtOAc 0.38, Et2O 0.38).
 */
export const sources = {
  aluminaConfirmed: 'Snyder 1968, ε° eluotropic series on alumina',
  silicaConfirmed: 'Sadek, Illustrated Pocket Dictionary of Chromatography, p. 74 (Snyder ε° on silica)',
  strengthFromMemory: 'Snyder ε° from memory (no published table checked yet)',
  alkaneMixture: 'from memory: light alkane mixture taken as hexane (ε° 0.01)',
  silicaFromAlumina: 'estimate: 0.77 × the alumina value (Snyder’s approximate silica/alumina ratio, from memory)',
  areaFromMemory: 'Snyder adsorbed area n_b from memory (no published table checked yet)',
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
  source: range
    ? `${sources.strengthFromMemory}; recalled range ${range[0]}–${range[1]}, midpoint used`
    : sources.strengthFromMemory,
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
