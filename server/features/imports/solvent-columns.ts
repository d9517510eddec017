import { requireSolvent } from '../../../shared/catalogue/solvents';
import { formatNumber } from '../../../shared/domain/format-number';
import { readNumber } from './cells';

export interface SolventAmount {
  solvent: string;
  header: string;
  cell: string;
}

export type AmountsEluent =
  | { ok: true; components: { solvent: string; parts: number }[]; note: string }
  | { ok: true; components: null }
  | { ok: false; message: string };

/** Rounds to three significant figures, so 0.980392 : 0.019608 reads back as 50 : 1. */
const significant = (value: number) => Number(value.toPrecision(3));

/**
 * The eluent of a row whose solvents sit in columns of their own (volume fractions summing to 1, % v/v or
 * parts, as in the open TLC dataset of Xu et al., Chem 2022): every solvent with a positive amount
 * becomes a component with parts = amount / smallest amount. A row with no positive amount has no eluent.
 */
export function eluentFromAmounts(amounts: readonly SolventAmount[]): AmountsEluent {
  const present: { solvent: string; amount: number }[] = [];
  for (const { solvent, header, cell } of amounts) {
    const read = readNumber(cell, `Amount of ${requireSolvent(solvent).label} (column "${header}")`, { percent: true });
    if (!read.ok) return read;
    if (read.value === null || read.value === 0) continue;
    if (read.value < 0)
      return {
        ok: false,
        message: `Amount of ${requireSolvent(solvent).label} (column "${header}") is negative: ${cell.trim()}.`,
      };
    const existing = present.find((item) => item.solvent === solvent);
    if (existing) existing.amount += read.value;
    else present.push({ solvent, amount: read.value });
  }
  if (present.length === 0) return { ok: true, components: null };
  const smallest = Math.min(...present.map((item) => item.amount));
  const components = present.map((item) => ({ solvent: item.solvent, parts: significant(item.amount / smallest) }));
  const labels = components.map((part) => requireSolvent(part.solvent).label).join(' : ');
  const parts = components.map((part) => formatNumber(part.parts)).join(' : ');
  return { ok: true, components, note: `Eluent read from the solvent columns: ${labels} ${parts}.` };
}
