import type { Molecule } from 'openchemlib';
import type { StructureError } from './errors';

export type StructureFormat = 'smiles' | 'molfile' | 'sdf';

/** A structure read from text and checked; `molecule` is the whole input (all fragments). */
export interface ParsedStructure {
  molecule: Molecule;
  format: StructureFormat;
  /** Text after the SMILES, or the molfile's title line, when present. */
  name?: string;
  /** SDF data items of the record (empty for SMILES and plain molfiles). */
  fields: Record<string, string>;
}

/** One SDF record: either a checked molecule or the reason it was refused. */
export interface SdfRecord {
  /** 1-based record number. */
  index: number;
  /** 1-based line where the record starts. */
  line: number;
  fields: Record<string, string>;
  structure?: ParsedStructure;
  error?: StructureError;
}
