import {
  acyls,
  alcohols,
  alkyls,
  amines,
  arylHalides,
  arylPartners,
  carbonylCaps,
  linkers,
  sulfonyls,
} from './building-blocks';

/**
 * A generated benchmark library: products enumerated from tests/bench/building-blocks.ts by common
 * reactions (amide coupling, sulfonylation, esterification, Williamson ether synthesis, reductive
 * amination, urea/carbamate formation, Suzuki coupling, and three-component amide/ester/sulfonamide
 * chains through amino-acid-like linkers). Generated structures, not a real collection.
 */

const fill = (template: string, part: string) => template.replace('{}', part);
const acyl = (r: string) => `O=C({})${r}`;
const sulfonyl = (r: string) => `O=S(=O)({})${r}`;

/** A reaction family: how many products it has and how to build product i. */
interface Family {
  size: number;
  product(i: number): string;
}

function family<A, B>(first: readonly A[], second: readonly B[], make: (a: A, b: B) => string): Family {
  return {
    size: first.length * second.length,
    product: (i) => make(first[Math.floor(i / second.length)], second[i % second.length]),
  };
}

function chain<A>(first: readonly A[], ends: readonly string[], make: (a: A, linker: string) => string): Family {
  const pairs = family(first, linkers, make);
  return family(
    Array.from({ length: pairs.size }, (_, i) => i),
    ends,
    (i, end) => fill(pairs.product(i), end),
  );
}

const families: Family[] = [
  family(acyls, amines, (r, n) => fill(acyl(r), n)),
  family(sulfonyls, amines, (r, n) => fill(sulfonyl(r), n)),
  family(acyls, alcohols, (r, o) => fill(acyl(r), o)),
  family(alkyls, alcohols, fill),
  family(alkyls, amines, fill),
  family(carbonylCaps, amines, fill),
  family(arylHalides, arylPartners, fill),
  chain(acyls, amines, (r, linker) => fill(acyl(r), linker)),
  chain(acyls, alcohols, (r, linker) => fill(acyl(r), linker)),
  chain(sulfonyls, amines, (r, linker) => fill(sulfonyl(r), linker)),
];

/** Total products before sampling. */
export const enumerableSize = families.reduce((sum, f) => sum + f.size, 0);

/** Deterministic PRNG (mulberry32) so every run builds the same library. */
function mulberry32(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function productAt(index: number): string {
  let i = index;
  for (const f of families) {
    if (i < f.size) return f.product(i);
    i -= f.size;
  }
  throw new RangeError(`No product ${index}.`);
}

/**
 * `count` distinct SMILES drawn without replacement from all enumerated products (uniformly, with a
 * fixed seed), in a stable order. Distinct strings may still be one molecule; the caller dedupes
 * by ID code.
 */
export function generateLibrary(count: number, seed = 20261202): string[] {
  if (count > enumerableSize) throw new RangeError(`Only ${enumerableSize} products can be enumerated.`);
  const random = mulberry32(seed);
  const picked = new Set<number>();
  while (picked.size < count) picked.add(Math.floor(random() * enumerableSize));
  return [...picked].map(productAt);
}
