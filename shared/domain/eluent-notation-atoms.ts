import type { Token } from './eluent-notation-scan';

export type NameToken = Extract<Token, { kind: 'name' }>;

/** A number as written: percentages or ratios (one per gradient step, "0→30%" has two) or a bare number. */
export type Value =
  { type: 'percent'; steps: number[] } | { type: 'ratio'; steps: number[][] } | { type: 'number'; value: number };

export type Atom =
  | { kind: 'name'; name: NameToken }
  | { kind: 'value'; value: Value }
  | { kind: 'cv'; value: number }
  | { kind: 'segment' | 'in' | 'plus' | 'open' | 'close' | 'sep' | 'gradient' };

type Single =
  { type: 'percent'; value: number } | { type: 'ratio'; values: number[] } | { type: 'number'; value: number };
type Raw = Atom | { kind: 'link'; dash: boolean } | { kind: 'single'; single: Single };

type NumberToken = Extract<Token, { kind: 'number' }>;
const isNumber = (token: Token | undefined): token is NumberToken => token?.kind === 'number';
const passThrough = new Set(['in', 'plus', 'open', 'close', 'gradient']);

/** Numbers with their % signs, ratio colons and "CV" units, before gradient chains are joined. */
function groupNumbers(tokens: readonly Token[]): Raw[] {
  const raw: Raw[] = [];
  for (let index = 0; index < tokens.length; index += 1) {
    const token = tokens[index];
    if (token.kind === 'name') raw.push({ kind: 'name', name: token });
    else if (token.kind === 'arrow' || token.kind === 'then' || token.kind === 'to')
      raw.push({ kind: 'link', dash: false });
    else if (token.kind === 'dash') raw.push({ kind: 'link', dash: true });
    else if (passThrough.has(token.kind)) raw.push({ kind: token.kind } as Atom);
    else if (!isNumber(token)) {
      if (token.kind !== 'cv' && token.kind !== 'unknown') raw.push({ kind: 'sep' });
    } else {
      const values = [token.value];
      while (
        (tokens[index + 1]?.kind === 'colon' || tokens[index + 1]?.kind === 'slash') &&
        isNumber(tokens[index + 2])
      ) {
        values.push((tokens[index + 2] as NumberToken).value);
        index += 2;
      }
      const next = tokens[index + 1]?.kind;
      if (values.length > 1) raw.push({ kind: 'single', single: { type: 'ratio', values } });
      else if (next === 'percent' || next === 'cv') {
        raw.push(
          next === 'cv'
            ? { kind: 'cv', value: token.value }
            : { kind: 'single', single: { type: 'percent', value: token.value } },
        );
        index += 1;
      } else raw.push({ kind: 'single', single: { type: 'number', value: token.value } });
    }
  }
  return raw;
}

/** Ratios chain with ratios, percentages and bare numbers with each other ("0-30%"); "1:1 to 100% EtOAc" is two steps. */
function joins(first: Single, next: Raw | undefined): boolean {
  return next?.kind === 'single' && (first.type === 'ratio') === (next.single.type === 'ratio');
}

function chainValue(chain: Single[]): Value | { error: string } {
  if (chain.length === 1 && chain[0].type === 'number') return chain[0];
  const ratios = chain.filter((single) => single.type === 'ratio');
  if (ratios.length > 0) {
    if (new Set(ratios.map((single) => single.values.length)).size > 1)
      return { error: 'Every ratio of a gradient needs the same number of parts.' };
    return { type: 'ratio', steps: ratios.map((single) => single.values) };
  }
  const numbers = chain.flatMap((single) => (single.type === 'ratio' ? [] : [single.value]));
  if (chain.some((single) => single.type === 'percent')) return { type: 'percent', steps: numbers };
  return { error: `Say what ${numbers.join(' → ')} means: percentages (add %) or a ratio (a:b).` };
}

/** Joins values linked by arrows, "to" or dashes into gradient chains; other arrows separate gradient segments. */
export function toAtoms(tokens: readonly Token[]): Atom[] | { error: string } {
  const raw = withoutBoilingRanges(groupNumbers(tokens));
  const atoms: Atom[] = [];
  for (let index = 0; index < raw.length; index += 1) {
    const item = raw[index];
    if (item.kind === 'link') atoms.push({ kind: item.dash ? 'sep' : 'segment' });
    else if (item.kind !== 'single') atoms.push(item);
    else {
      const chain = [item.single];
      while (raw[index + 1]?.kind === 'link' && joins(item.single, raw[index + 2])) {
        chain.push((raw[index + 2] as Extract<Raw, { kind: 'single' }>).single);
        index += 2;
      }
      const value = chainValue(chain);
      if ('error' in value) return value;
      atoms.push({ kind: 'value', value });
    }
  }
  return atoms;
}

const boilingNumber = (item: Raw | undefined) =>
  item?.kind === 'single' && item.single.type === 'number' && item.single.value >= 20 && item.single.value <= 200;

/** Drops a petroleum-ether boiling range written after the name: "PE 40–60", "petroleum ether (40-60 °C)". */
function withoutBoilingRanges(raw: Raw[]): Raw[] {
  const kept: Raw[] = [];
  for (let index = 0; index < raw.length; index += 1) {
    kept.push(raw[index]);
    const item = raw[index];
    if (item.kind !== 'name' || item.name.key !== 'petroleum-ether') continue;
    const open = raw[index + 1]?.kind === 'open' ? 1 : 0;
    const [low, link, high] = raw.slice(index + 1 + open, index + 4 + open);
    if (!boilingNumber(low) || link?.kind !== 'link' || !boilingNumber(high)) continue;
    const close = raw[index + 4 + open]?.kind === 'close' ? 1 : 0;
    if (open !== close) continue;
    index += 3 + open + close;
  }
  return kept;
}
