/**
 * The chemistry engine (OpenChemLib 9.25): parse and check structures, decide compound identity,
 * compute descriptors and classes, draw, fingerprint (worker threads) and search. Pure: no HTTP,
 * no database. See README.md in this folder for the decisions and the interface.
 */
export { analyseStructure } from './analyse';
export { type CompoundDescriptors } from './descriptors';
export { toSvg } from './depict';
export {
  closeFingerprintPool,
  FINGERPRINT_WORDS,
  fingerprintIdcodes,
  fingerprintIdcodeSync,
  fingerprintMolecule,
  searchGraphMolecule,
} from './fingerprint';
export { parentOf } from './identity';
export { parseSdf, parseStructure } from './parse';
export { StructureSearchIndex } from './search-index';
