import { analyseStructure as analyse } from '../chem';
import type { CompoundDescriptors } from '../chem';

/** What a compound row stores about a structure, from one pass of the chemistry engine. */
export interface StructureAnalysis extends CompoundDescriptors {
  idcode: string;
  canonicalSmiles: string;
  molfile: string;
  classes: string[];
  /** A name written after the SMILES or in the molfile's title line, if it looks like one. */
  name: string | null;
  isSalt: boolean;
  isMixture: boolean;
  svg: string;
}

/** A title line worth keeping as a name: letters, no program stamp, not too long. */
function plausibleName(text: string | undefined): string | null {
  const name = text?.trim();
  if (
    !name ||
    name.length > 120 ||
    !/\p{L}{2}/u.test(name) ||
    /^-?\s*(OEChem|RDKit|ChemDraw|Mrv|JME|CDK|OpenBabel|Actelion)/i.test(name)
  )
    return null;
  return name;
}

/**
 * Parses SMILES or molfile text with server/chem and flattens what a compound row needs: identity (ID code
 * of the neutral parent), canonical SMILES, molfile, descriptors, classes and a depiction. Throws the
 * engine's StructureError (400 syntax, 413 size, 422 chemistry) with its precise message. `depict: false`
 * skips the drawing (svg '') for bulk work that only stores compounds, such as imports.
 */
export function analyseStructure(text: string, options: { depict?: boolean } = {}): StructureAnalysis {
  const analysis = analyse(text, options);
  return {
    ...analysis.descriptors,
    idcode: analysis.identity.idcode,
    canonicalSmiles: analysis.identity.canonicalSmiles,
    molfile: analysis.identity.molfile,
    classes: analysis.classes,
    name: plausibleName(analysis.name),
    isSalt: analysis.identity.isSalt,
    isMixture: analysis.identity.isMixture,
    svg: analysis.svg,
  };
}

/** The stored descriptors of an analysis, as compounds keep them and the structure preview shows them. */
export function descriptorsOf(analysis: CompoundDescriptors): CompoundDescriptors {
  return {
    formula: analysis.formula,
    mw: analysis.mw,
    exactMass: analysis.exactMass,
    clogp: analysis.clogp,
    tpsa: analysis.tpsa,
    hbd: analysis.hbd,
    hba: analysis.hba,
    rotatableBonds: analysis.rotatableBonds,
    aromaticRings: analysis.aromaticRings,
    stereocentres: analysis.stereocentres,
    charge: analysis.charge,
  };
}
