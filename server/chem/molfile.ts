import { MAX_HEAVY_ATOMS, StructureError } from './errors';

/** Counts read from a molfile's header, after its blocks were checked. */
export interface MolfileHeader {
  version: 'V2000' | 'V3000';
  atoms: number;
  bonds: number;
}

const V2000_ATOM = /^\s*-?\d+(\.\d+)?\s+-?\d+(\.\d+)?\s+-?\d+(\.\d+)?\s+\S+/;

function invalid(message: string, line: number): StructureError {
  return new StructureError(400, 'molfile_invalid', message, { line });
}

function tooMany(atoms: number): StructureError {
  return new StructureError(
    422,
    'structure_too_many_atoms',
    `The molfile has ${atoms} atoms; the limit is ${MAX_HEAVY_ATOMS} heavy atoms.`,
  );
}

/** True when the text looks like an MDL molfile or SDF record (a V2000/V3000 counts line). */
export function looksLikeMolfile(text: string): boolean {
  return /^.{0,40}(V2000|V3000)\s*$/m.test(text) || /^M {2}V30 /m.test(text);
}

function checkEnd(lines: string[], from: number): void {
  if (!lines.slice(from).some((line) => line.startsWith('M  END'))) {
    throw invalid(`The molfile is truncated: no "M  END" line after line ${from}.`, from);
  }
}

function checkV2000(lines: string[]): MolfileHeader {
  const counts = lines[3] ?? '';
  const atoms = Number.parseInt(counts.slice(0, 3), 10);
  const bonds = Number.parseInt(counts.slice(3, 6), 10);
  if (!Number.isFinite(atoms) || !Number.isFinite(bonds))
    throw invalid('Line 4 (counts line) does not start with the atom and bond counts.', 4);
  if (atoms === 0) throw new StructureError(422, 'structure_empty', 'The molfile has no atoms.', { line: 4 });
  if (atoms > MAX_HEAVY_ATOMS * 3) throw tooMany(atoms);
  for (let i = 0; i < atoms; i++) {
    if (!V2000_ATOM.test(lines[4 + i] ?? '')) {
      throw invalid(
        `Line ${5 + i}: expected atom ${i + 1} of ${atoms} (x y z element), found "${(lines[4 + i] ?? '').trim().slice(0, 40)}".`,
        5 + i,
      );
    }
  }
  for (let i = 0; i < bonds; i++) {
    const line = lines[4 + atoms + i] ?? '';
    const a = Number.parseInt(line.slice(0, 3), 10);
    const b = Number.parseInt(line.slice(3, 6), 10);
    if (!(a >= 1 && a <= atoms && b >= 1 && b <= atoms)) {
      throw invalid(
        `Line ${5 + atoms + i}: expected bond ${i + 1} of ${bonds} between atoms 1–${atoms}, found "${line.trim().slice(0, 40)}".`,
        5 + atoms + i,
      );
    }
  }
  checkEnd(lines, 4 + atoms + bonds);
  return { version: 'V2000', atoms, bonds };
}

function blockLength(lines: string[], name: string): { start: number; length: number } | null {
  const start = lines.findIndex((line) => line.startsWith(`M  V30 BEGIN ${name}`));
  if (start < 0) return null;
  const end = lines.findIndex((line, i) => i > start && line.startsWith(`M  V30 END ${name}`));
  if (end < 0) throw invalid(`The ${name} block opened on line ${start + 1} is never closed.`, start + 1);
  return { start, length: end - start - 1 };
}

function checkV3000(lines: string[]): MolfileHeader {
  const countsIndex = lines.findIndex((line) => line.startsWith('M  V30 COUNTS'));
  if (countsIndex < 0) throw invalid('No "M  V30 COUNTS" line.', 4);
  const [atoms, bonds] = lines[countsIndex].slice(13).trim().split(/\s+/).map(Number);
  if (!Number.isFinite(atoms) || !Number.isFinite(bonds))
    throw invalid(`Line ${countsIndex + 1}: COUNTS needs atom and bond numbers.`, countsIndex + 1);
  if (atoms === 0)
    throw new StructureError(422, 'structure_empty', 'The molfile has no atoms.', { line: countsIndex + 1 });
  if (atoms > MAX_HEAVY_ATOMS * 3) throw tooMany(atoms);
  const atomBlock = blockLength(lines, 'ATOM');
  if (!atomBlock || atomBlock.length !== atoms) {
    throw invalid(
      `The ATOM block has ${atomBlock?.length ?? 0} lines but COUNTS announces ${atoms} atoms.`,
      (atomBlock?.start ?? countsIndex) + 1,
    );
  }
  const bondBlock = blockLength(lines, 'BOND');
  if ((bondBlock?.length ?? 0) !== bonds) {
    throw invalid(
      `The BOND block has ${bondBlock?.length ?? 0} lines but COUNTS announces ${bonds} bonds.`,
      (bondBlock?.start ?? countsIndex) + 1,
    );
  }
  const atomIndices = checkV3000Atoms(lines, atomBlock.start, atoms);
  if (bondBlock) checkV3000Bonds(lines, bondBlock.start, bonds, atomIndices);
  checkEnd(lines, countsIndex);
  return { version: 'V3000', atoms, bonds };
}

/** Each V3000 atom line is "M  V30 index element x y z aamap …" (CTfile format); returns the indices given. */
function checkV3000Atoms(lines: string[], start: number, atoms: number): Set<number> {
  const indices = new Set<number>();
  for (let i = 1; i <= atoms; i++) {
    const fields = lines[start + i].slice(7).trim().split(/\s+/);
    const [index, x, y, z] = [Number(fields[0]), Number(fields[2]), Number(fields[3]), Number(fields[4])];
    if (
      !(Number.isInteger(index) && index >= 1) ||
      !fields[1] ||
      ![x, y, z].every(Number.isFinite) ||
      indices.has(index)
    ) {
      throw invalid(
        `Line ${start + i + 1}: expected atom ${i} of ${atoms} (index element x y z), found "${lines[start + i].trim().slice(0, 40)}".`,
        start + i + 1,
      );
    }
    indices.add(index);
  }
  return indices;
}

/** Each V3000 bond line is "M  V30 index type atom1 atom2 …"; both atoms must be indices of the ATOM block. */
function checkV3000Bonds(lines: string[], start: number, bonds: number, atomIndices: Set<number>) {
  for (let i = 1; i <= bonds; i++) {
    const [, type, a, b] = lines[start + i].slice(7).trim().split(/\s+/).map(Number);
    if (!Number.isInteger(type) || !atomIndices.has(a) || !atomIndices.has(b)) {
      throw invalid(
        `Line ${start + i + 1}: expected bond ${i} of ${bonds} between atoms of the ATOM block, found ` +
          `"${lines[start + i].trim().slice(0, 40)}".`,
        start + i + 1,
      );
    }
  }
}

/** Joins V3000 continuation lines (a trailing "-" continues on the next "M  V30 " line). */
function joinV3000Continuations(lines: string[]): string[] {
  const out: string[] = [];
  for (const line of lines) {
    const previous = out[out.length - 1];
    if (previous?.startsWith('M  V30 ') && previous.endsWith('-') && line.startsWith('M  V30 ')) {
      out[out.length - 1] = previous.slice(0, -1) + line.slice(7);
    } else out.push(line);
  }
  return out;
}

/**
 * Checks a molfile's structure (MDL CTfile format, V2000 and V3000): counts, that every announced
 * atom and bond line is there and well formed, and the closing "M  END". OpenChemLib reads
 * garbage or truncated text as an empty molecule without error (../shared/STACK.md), hence this.
 */
export function checkMolfile(text: string): MolfileHeader {
  const lines = text.split(/\r?\n/);
  if (/V3000\s*$/.test(lines[3] ?? '') || lines.some((line) => line.startsWith('M  V30 ')))
    return checkV3000(joinV3000Continuations(lines));
  if (/V2000\s*$/.test(lines[3] ?? '')) return checkV2000(lines);
  throw invalid('Line 4 must be the counts line ending in V2000 or V3000 (are the three header lines missing?).', 4);
}

/**
 * Puts back header lines lost when pasted text was trimmed: the counts line (ending in V2000 or
 * V3000) must be line 4, so blank lines are prepended when it appears earlier.
 */
export function restoreHeader(text: string): string {
  const lines = text.split(/\r?\n/);
  const counts = lines.findIndex((line) => /V[23]000\s*$/.test(line));
  return counts >= 0 && counts < 3 ? `${'\n'.repeat(3 - counts)}${text}` : text;
}

/**
 * Sets the V2000 chiral flag to 1. OpenChemLib reads flag 0 as "racemic" (a different ID code,
 * ../shared/STACK.md), while most drawing programs write 0 for any drawing; like RDKit we take
 * wedges as the absolute configuration drawn. V3000 files are read as absolute already.
 */
export function withChiralFlagSet(text: string): string {
  const lines = text.split(/\r?\n/);
  const counts = lines[3];
  if (!counts || !/V2000\s*$/.test(counts) || counts.length < 15) return text;
  if (counts.slice(12, 15).trim() === '1') return text;
  lines[3] = `${counts.slice(0, 12)}  1${counts.slice(15)}`;
  return lines.join('\n');
}
