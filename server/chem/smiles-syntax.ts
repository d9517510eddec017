import { MAX_HEAVY_ATOMS, StructureError } from './errors';

/** One atom as written in a SMILES string. */
export interface SmilesAtomToken {
  /** 1-based character position of the atom in the string. */
  position: number;
  symbol: string;
  /** Written in lower case (aromatic), e.g. `c`, `n`, `[nH]`. */
  aromatic: boolean;
  /** A hydrogen written as its own atom, e.g. `[H]` or `[2H]`. */
  hydrogen: boolean;
}

const ORGANIC_SUBSET = /^(Cl|Br|B|C|N|O|P|S|F|I|b|c|n|o|p|s|\*)/;
const BOND_SYMBOLS = new Set(['-', '=', '#', '$', ':', '/', '\\', '.']);

function syntaxError(message: string, position: number, token?: string): StructureError {
  return new StructureError(400, 'smiles_syntax', message, { position, token });
}

function bracketAtom(content: string): { symbol: string; aromatic: boolean } {
  const match = /^\d*([A-Za-z][a-z]?)/.exec(content);
  const symbol = match?.[1] ?? '';
  return { symbol, aromatic: symbol.length > 0 && symbol[0] === symbol[0].toLowerCase() };
}

/**
 * Checks what OpenChemLib's SMILES parser lets through silently (see ../shared/STACK.md):
 * unclosed branches such as `CC(C`, empty branches `C()C`, ring bonds opened and never closed,
 * unclosed brackets, and the number of heavy atoms (refused above MAX_HEAVY_ATOMS before any
 * coordinates are generated). Returns the atoms in input order. Grammar: OpenSMILES
 * (opensmiles.org) — organic subset, bracket atoms, bonds, branches, ring closures `1` and `%nn`.
 */
export function scanSmiles(smiles: string): SmilesAtomToken[] {
  const atoms: SmilesAtomToken[] = [];
  const branchStack: number[] = [];
  const openRings = new Map<string, number>();
  let heavy = 0;
  let i = 0;
  while (i < smiles.length) {
    const ch = smiles[i];
    const position = i + 1;
    if (ch === '[') {
      const end = smiles.indexOf(']', i);
      if (end < 0)
        throw syntaxError(`Bracket atom opened at position ${position} is never closed with "]".`, position, '[');
      const { symbol, aromatic } = bracketAtom(smiles.slice(i + 1, end));
      const hydrogen = symbol === 'H';
      atoms.push({ position, symbol, aromatic, hydrogen });
      if (!hydrogen) heavy++;
      i = end + 1;
    } else if (ch === '(') {
      if (smiles[i + 1] === ')') throw syntaxError(`Empty branch "()" at position ${position}.`, position, '()');
      branchStack.push(position);
      i++;
    } else if (ch === ')') {
      if (branchStack.length === 0)
        throw syntaxError(`Closing ")" at position ${position} has no opening "(".`, position, ')');
      branchStack.pop();
      i++;
    } else if (/[0-9%]/.test(ch)) {
      const label = ch === '%' ? smiles.slice(i, i + 3) : ch;
      if (ch === '%' && !/^%\d\d$/.test(label))
        throw syntaxError(`Ring bond "%" at position ${position} needs two digits.`, position, '%');
      if (openRings.has(label)) openRings.delete(label);
      else openRings.set(label, position);
      i += label.length;
    } else if (BOND_SYMBOLS.has(ch)) {
      i++;
    } else {
      const match = ORGANIC_SUBSET.exec(smiles.slice(i));
      if (!match) throw syntaxError(`Unexpected character "${ch}" at position ${position}.`, position, ch);
      const symbol = match[1];
      atoms.push({ position, symbol, aromatic: symbol === symbol.toLowerCase() && symbol !== '*', hydrogen: false });
      heavy++;
      i += symbol.length;
    }
    if (heavy > MAX_HEAVY_ATOMS) {
      throw new StructureError(
        422,
        'structure_too_many_atoms',
        `More than ${MAX_HEAVY_ATOMS} heavy atoms; the limit is ${MAX_HEAVY_ATOMS}.`,
        { position },
      );
    }
  }
  if (branchStack.length > 0) {
    const position = branchStack[branchStack.length - 1];
    throw new StructureError(
      400,
      'smiles_unclosed_branch',
      `Branch "(" opened at position ${position} is never closed with ")".`,
      { position, token: '(' },
    );
  }
  for (const [label, position] of openRings) {
    throw new StructureError(
      400,
      'smiles_unclosed_ring',
      `Ring bond ${label} opened at position ${position} is never closed.`,
      { position, token: label },
    );
  }
  return atoms;
}
