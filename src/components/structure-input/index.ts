export { StructureInput, type StructureInputProps } from './structure-input';
export type { ParsedStructure } from './types';
export { parseStructure, structureKeys } from './use-structure-parse';
