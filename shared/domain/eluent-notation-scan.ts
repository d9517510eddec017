import { eluentNameIndex } from '../catalogue/lookup';
import { solventByKey } from '../catalogue/solvents';

/** Lexical pieces of an eluent notation such as "DCM/MeOH 9:1 + 1% Et3N". */
export type Token =
  | { kind: 'name'; role: 'solvent' | 'additive'; key: string; text: string }
  | { kind: 'number'; value: number; text: string }
  | { kind: 'unknown'; text: string }
  | {
      kind:
        | 'percent'
        | 'colon'
        | 'slash'
        | 'dash'
        | 'arrow'
        | 'then'
        | 'to'
        | 'comma'
        | 'plus'
        | 'open'
        | 'close'
        | 'in'
        | 'cv'
        | 'gradient';
    };

interface TrieNode {
  children: Map<string, TrieNode>;
  key?: string;
}

const trie: TrieNode = { children: new Map() };
for (const [normalised, entry] of eluentNameIndex.normalisedNames()) {
  let node = trie;
  for (const char of normalised) {
    if (!node.children.has(char)) node.children.set(char, { children: new Map() });
    node = node.children.get(char) as TrieNode;
  }
  node.key = entry.key;
}

const skippable = /[\s.\-‐‑‒–—_'’]/;
const isAlphanumeric = (char: string | undefined) => char !== undefined && /[\p{L}\p{N}]/u.test(char);
const fold = (char: string) => char.normalize('NFKD').replace(/\p{M}/gu, '').toLowerCase();

/** Longest catalogue name starting at `start`, ending where no letter or digit follows; spaces, dots and hyphens inside are ignored. */
function matchName(text: string, start: number): { key: string; end: number } | null {
  let node = trie;
  let best: { key: string; end: number } | null = null;
  for (let index = start; index < text.length; index += 1) {
    const char = text[index];
    if (index > start && skippable.test(char)) continue;
    const next = node.children.get(fold(char));
    if (!next) break;
    node = next;
    if (node.key && !isAlphanumeric(text[index + 1])) best = { key: node.key, end: index + 1 };
  }
  return best;
}

const keywords: Record<string, Token['kind'] | 'ignore'> = {
  in: 'in',
  to: 'to',
  then: 'then',
  followed: 'then',
  with: 'plus',
  plus: 'plus',
  containing: 'plus',
  contains: 'plus',
  and: 'plus',
  w: 'plus',
  add: 'plus',
  added: 'plus',
  cv: 'cv',
  cvs: 'cv',
  column: 'cv',
  volume: 'cv',
  volumes: 'cv',
  gradient: 'gradient',
  grad: 'gradient',
};
const ignoredWords = new Set([
  'v',
  'vol',
  'pure',
  'neat',
  'only',
  'isocratic',
  'iso',
  'from',
  'eluent',
  'eluant',
  'eluting',
  'elution',
  'solvent',
  'solvents',
  'system',
  'mixture',
  'mix',
  'ratio',
  'of',
  'by',
  'approx',
  'ca',
  'ml',
  'parts',
  'part',
  'over',
  'linear',
  'step',
  'steps',
  'flash',
  'tlc',
  'bp',
  'conc',
  'abs',
  'dry',
  'anhydrous',
]);

const symbols: [RegExp, Token['kind'] | 'ignore'][] = [
  [/^(?:->|=>|-->|[→⟶➔➜⇒])/, 'arrow'],
  [/^[-‐‑‒–—−]/, 'dash'],
  [/^%/, 'percent'],
  [/^[:∶]/, 'colon'],
  [/^[/\\]/, 'slash'],
  [/^[,;=&]/, 'comma'],
  [/^\+/, 'plus'],
  [/^[([{]/, 'open'],
  [/^[)\]}]/, 'close'],
  [/^[~～]/, 'dash'],
  [/^["'≈?*]/, 'ignore'],
];

/** Removes notes that carry no composition: "v/v", "(vol/vol)", "°C". */
function stripNoise(text: string): string {
  return text
    .normalize('NFKC')
    .replace(/\(?\s*\bv(?:ol)?\s*\/\s*v(?:ol)?\b\s*\)?/gi, ' ')
    .replace(/°\s*C\b/g, ' ');
}

/** Splits a notation into tokens; letters outside known names become `unknown` tokens (adjacent ones merged). */
export function tokenise(notation: string): Token[] | { unexpected: string } {
  const text = stripNoise(notation);
  const tokens: Token[] = [];
  let index = 0;
  while (index < text.length) {
    const char = text[index];
    if (/\s/.test(char)) {
      index += 1;
      continue;
    }
    const name = /\p{L}/u.test(text[index - 1] ?? '') ? null : matchName(text, index);
    if (name && !(/\d/.test(char) && /\d/.test(text[index - 1] ?? ''))) {
      tokens.push({
        kind: 'name',
        role: solventByKey(name.key) ? 'solvent' : 'additive',
        key: name.key,
        text: text.slice(index, name.end),
      });
      index = name.end;
      continue;
    }
    const number = /^(?:\d+(?:[.,]\d+)?|\.\d+)/.exec(text.slice(index));
    if (number) {
      tokens.push({ kind: 'number', value: Number(number[0].replace(',', '.')), text: number[0] });
      index += number[0].length;
      continue;
    }
    const word = /^\p{L}[\p{L}\p{N}]*/u.exec(text.slice(index));
    if (word) {
      const kind = keywords[word[0].toLowerCase()] ?? (ignoredWords.has(word[0].toLowerCase()) ? 'ignore' : undefined);
      const previous = tokens[tokens.length - 1];
      if (kind === undefined && previous?.kind === 'unknown') previous.text += ` ${word[0]}`;
      else if (kind === undefined) tokens.push({ kind: 'unknown', text: word[0] });
      else if (kind !== 'ignore') tokens.push({ kind } as Token);
      index += word[0].length;
      continue;
    }
    const symbol = symbols.find(([pattern]) => pattern.test(text.slice(index)));
    if (!symbol) return { unexpected: char };
    const length = (symbol[0].exec(text.slice(index)) as RegExpExecArray)[0].length;
    if (symbol[1] !== 'ignore') tokens.push({ kind: symbol[1] } as Token);
    index += length;
  }
  return tokens;
}
