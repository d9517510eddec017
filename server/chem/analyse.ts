import type { Molecule } from 'openchemlib';
import type { CompoundClassKey } from '../../shared/catalogue/compound-classes';
import { classify } from './classes';
import { computeDescriptors, type CompoundDescriptors } from './descriptors';
import { toSvg } from './depict';
import { identify, parentOf, type CompoundIdentity } from './identity';
import { parseStructure, type StructureFormat } from './parse';

/** Everything the engine says about one structure text. */
export interface StructureAnalysis {
  format: StructureFormat;
  /** Name after the SMILES or molfile title, when given. */
  name?: string;
  /** SDF data items of a single-record SDF input. */
  fields: Record<string, string>;
  identity: CompoundIdentity;
  /** Descriptors of the neutral parent. */
  descriptors: CompoundDescriptors;
  classes: CompoundClassKey[];
  /** SVG of the neutral parent. */
  svg: string;
  /** The whole input as parsed (counter-ions included): use it as a substructure query. */
  input: Molecule;
  /** The neutral parent: fingerprint it, or use it as a similarity query. */
  parent: Molecule;
}

/**
 * Parses, checks and describes one structure (SMILES, molfile or one SDF record): identity,
 * descriptors, classes and a drawing. Throws StructureError for input it refuses. ~5–15 ms.
 * `depict: false` skips the drawing (~3 ms; `svg` is then '') for bulk work such as imports.
 */
export function analyseStructure(text: string, options: { depict?: boolean } = {}): StructureAnalysis {
  const parsed = parseStructure(text);
  const split = parentOf(parsed.molecule);
  return {
    format: parsed.format,
    name: parsed.name,
    fields: parsed.fields,
    identity: identify(parsed.molecule, split),
    descriptors: computeDescriptors(split.parent),
    classes: classify(split.parent, { molecule: parsed.molecule, fragments: split.fragments }),
    svg: options.depict === false ? '' : toSvg(split.parent),
    input: parsed.molecule,
    parent: split.parent,
  };
}
