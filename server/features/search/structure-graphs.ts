import { Molecule } from 'openchemlib';
import { searchGraphMolecule, type StructureSearchIndex } from '../../chem';

/** Molecules decoded per slice of background work (~0.13 ms each, so a slice holds the thread ~30 ms). */
const SLICE = 250;

/** The compact search graph of a stored ID code (for the fast substructure matcher), or undefined. */
export function graphOfIdcode(idcode: string): Uint8Array | undefined {
  try {
    return searchGraphMolecule(Molecule.fromIDCode(idcode, false));
  } catch {
    return undefined;
  }
}

/**
 * Attaches search graphs to entries loaded without them, in slices that yield to the event loop, so a
 * rebuild answers searches at once (OpenChemLib's SSSearcher decides until an entry has its graph) and
 * the fast matcher takes over as graphs arrive. Stops early when `cancelled()` says so.
 */
export async function attachGraphsInBackground(
  index: StructureSearchIndex,
  entries: { id: number; idcode: string }[],
  cancelled: () => boolean,
): Promise<void> {
  for (let start = 0; start < entries.length; start += SLICE) {
    if (cancelled()) return;
    for (const entry of entries.slice(start, start + SLICE)) {
      const graph = graphOfIdcode(entry.idcode);
      if (graph) index.attachGraph(entry.id, entry.idcode, graph);
    }
    await new Promise((resolve) => setImmediate(resolve));
  }
}
