import { Molecule } from 'openchemlib';
import { toSvg } from '../../chem';
import type { Compound } from '../../db/models';

const cache = new Map<string, string>();
const CACHE_LIMIT = 2_000;

/** The compound's SVG drawn from its stored molfile (2D coordinates kept), memoised by molfile. */
export function compoundSvg(compound: Pick<Compound, 'molfile' | 'idcode'>): string {
  const cached = cache.get(compound.molfile);
  if (cached) return cached;
  const svg = toSvg(Molecule.fromMolfile(compound.molfile), { width: 400, height: 280 });
  if (cache.size >= CACHE_LIMIT) cache.delete(cache.keys().next().value as string);
  cache.set(compound.molfile, svg);
  return svg;
}
