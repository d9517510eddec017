export type { StructureParseResult as ParsedStructure } from '../../../shared/schemas/compound';

/** Where in the input the server found the problem (all counted from 1; see server/chem/errors.ts). */
export interface StructureProblemPlace {
  position?: number;
  line?: number;
  atom?: number;
  token?: string;
  record?: number;
}
