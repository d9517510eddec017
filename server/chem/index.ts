/**
 * The chemistry engine (OpenChemLib 9.25): parse and check structures, decide compound identity,
 * compute descriptors and classes, draw, fingerprint (worker threads) and search. Pure: no HTTP,
 * no database. See README.md in this folder for the decisions and the interface.
 */
export { analyseStructure, type StructureAnalysis } from './analyse';
export { classify, type ClassifyInput } from './classes';
export { computeDescriptors, hillFormula, type CompoundDescriptors } from './descriptors';
export { idcodeToSvg, toSvg, type DepictOptions } from './depict';
export {
  MAX_HEAVY_ATOMS,
  MAX_STRUCTURE_BYTES,
  StructureError,
  type StructureErrorCode,
  type StructureErrorDetails,
} from './errors';
export {
  closeFingerprintPool,
  FINGERPRINT_WORDS,
  fingerprintIdcodes,
  fingerprintIdcodeSync,
  fingerprintMolecule,
  FingerprintPool,
  searchGraphMolecule,
  searchKeysForIdcodes,
} from './fingerprint';
export { identify, parentOf, type CompoundIdentity, type FragmentRole, type FragmentSummary } from './identity';
export { parseSdf, parseStructure, type ParsedStructure, type SdfRecord, type StructureFormat } from './parse';
export { StructureSearchIndex, type SearchEntry } from './search-index';
export { FingerprintIndex, type SimilarityHit } from './similarity-index';
export type { SubstructureResult } from './substructure';
