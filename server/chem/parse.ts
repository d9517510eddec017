import { Molecule } from 'openchemlib';
import { checkMolecule, type AtomLocator } from './checks';
import { cleanMessage, MAX_STRUCTURE_BYTES, StructureError } from './errors';
import { checkMolfile, looksLikeMolfile, restoreHeader, withChiralFlagSet } from './molfile';
import { splitSdf } from './sdf';
import { parseSmilesLine } from './parse-smiles';
import type { ParsedStructure, SdfRecord, StructureFormat } from './structure-types';

export type { ParsedStructure, SdfRecord, StructureFormat } from './structure-types';

function checkSize(text: string): void {
  const bytes = Buffer.byteLength(text, 'utf8');
  if (bytes > MAX_STRUCTURE_BYTES) {
    throw new StructureError(
      413,
      'structure_too_large',
      `The structure text is ${bytes} bytes; the limit is ${MAX_STRUCTURE_BYTES} bytes.`,
    );
  }
}

function molfileLocator(molfile: string): AtomLocator {
  const lines = molfile.split(/\r?\n/);
  const v2000 = /V2000\s*$/.test(lines[3] ?? '');
  const heavyLines: number[] = [];
  if (v2000) {
    const atoms = Number.parseInt((lines[3] ?? '').slice(0, 3), 10);
    for (let i = 0; i < atoms; i++) if ((lines[4 + i] ?? '').slice(31, 34).trim() !== 'H') heavyLines.push(5 + i);
  }
  return {
    describe: (i) =>
      heavyLines[i]
        ? { where: `Atom on line ${heavyLines[i]}`, details: { line: heavyLines[i], atom: i + 1 } }
        : { where: `Heavy atom ${i + 1}`, details: { atom: i + 1 } },
  };
}

/** Reads one molfile (V2000 or V3000) after checking its blocks; see checkMolfile. */
function parseMolfileText(molfile: string, fields: Record<string, string>, format: StructureFormat): ParsedStructure {
  checkSize(molfile);
  checkMolfile(molfile);
  let molecule: Molecule;
  try {
    molecule = Molecule.fromMolfile(withChiralFlagSet(molfile));
  } catch (error) {
    throw new StructureError(400, 'molfile_invalid', `The molfile could not be read: ${cleanMessage(error)}.`);
  }
  checkMolecule(molecule, molfileLocator(molfile));
  const title = molfile.split(/\r?\n/, 1)[0]?.trim();
  return { molecule, format, name: title || undefined, fields };
}

/**
 * Reads one structure from text, detecting the format: an MDL molfile (V2000/V3000), a single SD
 * file record, or one line of SMILES (optionally followed by a name after whitespace, as in SMILES
 * files). Refuses with a StructureError (400 syntax, 413 over 20 kB, 422 chemistry) everything
 * listed in checkMolecule, scanSmiles and checkMolfile, plus several SDF records or SMILES lines.
 */
export function parseStructure(text: string): ParsedStructure {
  checkSize(text);
  const normalised = text.replace(/^\uFEFF/, '').replace(/\r\n?/g, '\n');
  if (normalised.trim() === '')
    throw new StructureError(400, 'structure_empty', 'No structure given: the text is empty.');
  if (!looksLikeMolfile(normalised)) return parseSmilesLine(normalised);
  const records = splitSdf(restoreHeader(normalised));
  if (records.length > 1) {
    throw new StructureError(
      422,
      'sdf_several_records',
      `The text holds ${records.length} SDF records; one structure was expected (import several through an SDF file).`,
      { record: 2, line: records[1].line },
    );
  }
  const [record] = records;
  const format: StructureFormat =
    normalised.includes('$$$$') || Object.keys(record.fields).length > 0 ? 'sdf' : 'molfile';
  return parseMolfileText(record.molfile, record.fields, format);
}

/**
 * Reads every record of an SD file (MDL CTfile format). A record that fails gets its StructureError
 * instead of a structure, so one bad record never hides the others. The caller limits the file size.
 */
export function parseSdf(text: string): SdfRecord[] {
  const normalised = text.replace(/^\uFEFF/, '').replace(/\r\n?/g, '\n');
  return splitSdf(normalised).map((record) => {
    const base = { index: record.index, line: record.line, fields: record.fields };
    try {
      return { ...base, structure: parseMolfileText(record.molfile, record.fields, 'sdf') };
    } catch (error) {
      if (error instanceof StructureError) return { ...base, error };
      throw error;
    }
  });
}
