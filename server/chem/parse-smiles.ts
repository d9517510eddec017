import { Molecule } from 'openchemlib';
import { checkMolecule, type AtomLocator } from './checks';
import { cleanMessage, StructureError } from './errors';
import type { ParsedStructure } from './structure-types';
import { scanSmiles, type SmilesAtomToken } from './smiles-syntax';

function smilesLocator(tokens: SmilesAtomToken[]): AtomLocator {
  const heavy = tokens.filter((token) => !token.hydrogen);
  return {
    describe: (i) => {
      const token = heavy[i];
      return token
        ? {
            where: `Atom ${i + 1} at position ${token.position}`,
            details: { atom: i + 1, position: token.position, token: token.symbol },
          }
        : { where: `Atom ${i + 1}`, details: { atom: i + 1 } };
    },
    writtenAromatic: (i) => heavy[i]?.aromatic ?? false,
  };
}

/** Parses one SMILES string with OpenChemLib after the syntax scan; throws StructureError. */
function readSmiles(smiles: string): { molecule: Molecule; tokens: SmilesAtomToken[] } {
  if (/^InChI=/i.test(smiles))
    throw new StructureError(400, 'smiles_syntax', 'InChI is not accepted; paste SMILES or a molfile.', {
      position: 1,
    });
  const tokens = scanSmiles(smiles);
  const wildcard = tokens.find((token) => token.symbol === '*');
  if (wildcard) {
    throw new StructureError(
      422,
      'pseudo_atom',
      `Wildcard atom "*" at position ${wildcard.position}; a compound needs real elements.`,
      { position: wildcard.position, token: '*' },
    );
  }
  try {
    return { molecule: Molecule.fromSmiles(smiles), tokens };
  } catch (error) {
    const message = cleanMessage(error);
    const at = /position:?\s*(\d+)/i.exec(message);
    const position = at ? Number(at[1]) + 1 : undefined;
    const reason = message.replace(/[.;]?\s*position:?\s*\d+\s*$/i, '');
    throw new StructureError(
      400,
      'smiles_syntax',
      `SMILES not understood: ${reason}${position ? ` (at position ${position})` : ''}.`,
      { position },
    );
  }
}

function isStructure(text: string): boolean {
  try {
    return readSmiles(text).molecule.getAllAtoms() > 0;
  } catch {
    return false;
  }
}

/**
 * Reads one line of SMILES. Whitespace ends a SMILES string (OpenSMILES); what follows is taken
 * as the compound's name, as in SMILES files ("CCO ethanol"), unless it is itself a valid SMILES
 * ("CC O"): then the space was probably a typo and the input is refused rather than half-read.
 * Several non-empty lines are refused: one structure is expected.
 */
export function parseSmilesLine(text: string): ParsedStructure {
  const lines = text.split('\n').filter((line) => line.trim() !== '');
  if (lines.length > 1) {
    throw new StructureError(
      422,
      'structure_several',
      `The text has ${lines.length} lines of SMILES; one structure was expected.`,
      { line: 2 },
    );
  }
  const line = lines[0].trim();
  const space = line.search(/\s/);
  const smiles = space < 0 ? line : line.slice(0, space);
  const rest = space < 0 ? '' : line.slice(space).trim();
  const { molecule, tokens } = readSmiles(smiles);
  if (rest) {
    const firstWord = rest.split(/\s+/)[0];
    if (isStructure(firstWord)) {
      throw new StructureError(
        400,
        'smiles_syntax',
        `Text after the space at position ${space + 1} ("${firstWord}") is itself a structure; join ` +
          `fragments with "." or remove the space.`,
        { position: space + 1 },
      );
    }
  }
  checkMolecule(molecule, smilesLocator(tokens));
  return { molecule, format: 'smiles', name: rest || undefined, fields: {} };
}
