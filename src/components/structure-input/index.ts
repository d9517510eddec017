export { StructureInput } from './structure-input';
export type { ParsedStructure } from './types';
