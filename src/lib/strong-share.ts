import { solventByKey } from '../../shared/catalogue/solvents';
import { formatNumber } from '../../shared/domain/format-number';

/** "20 % EtOAc": the stronger solvent's share of the eluent, named, as a chemist says it (never "% strong"). */
export function strongShareLabel(summary: {
  strongSolvent: string | null;
  strongPercent: number | null;
}): string | null {
  if (summary.strongPercent === null) return null;
  const solvent = summary.strongSolvent
    ? (solventByKey(summary.strongSolvent)?.label ?? summary.strongSolvent)
    : 'the stronger solvent';
  return `${formatNumber(summary.strongPercent, 1)} % ${solvent}`;
}
