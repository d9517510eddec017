import type { ClassDetail, Usage } from '../../../../shared/schemas/classes';
import { formatNumber } from '../../../../shared/domain/format-number';
import { OutcomeBar } from './outcome-bar';

/** Stains or additives used on the class, with in how many records they went clean or partial. */
export function UsageList({ items, empty }: { items: Usage[]; empty: string }) {
  if (items.length === 0) return <p className="text-sm text-ink-soft">{empty}</p>;
  return (
    <ul className="space-y-1 text-sm">
      {items.map((item) => (
        <li key={item.key} className="flex items-baseline justify-between gap-3">
          <span>{item.label}</span>
          <span className="figure text-xs text-ink-soft">
            worked in {item.worked} of {item.records}
          </span>
        </li>
      ))}
    </ul>
  );
}

/** Solvent pairs used on the class, most used first, with outcomes and the span of % strong solvent. */
export function SolventPairs({ pairs }: { pairs: ClassDetail['solventPairs'] }) {
  if (pairs.length === 0) return <p className="text-sm text-ink-soft">No eluents recorded yet.</p>;
  return (
    <table className="w-full text-sm">
      <thead className="text-left text-xs text-ink-soft">
        <tr>
          <th scope="col" className="py-1 font-medium">
            Solvents
          </th>
          <th scope="col" className="px-2 py-1 text-right font-medium">
            Records
          </th>
          <th scope="col" className="px-2 py-1 text-right font-medium">
            % stronger solvent
          </th>
          <th scope="col" className="py-1 pl-3 font-medium">
            Outcomes
          </th>
        </tr>
      </thead>
      <tbody>
        {pairs.map((pair) => (
          <tr key={pair.solvents.join('+')} className="border-t border-line/70">
            <td className="py-1.5">{pair.labels.join(' / ')}</td>
            <td className="figure px-2 py-1.5 text-right">{pair.records}</td>
            <td className="figure px-2 py-1.5 text-right">
              {pair.strongPercent
                ? `${formatNumber(pair.strongPercent[0], 1)}–${formatNumber(pair.strongPercent[1], 1)}`
                : '—'}
            </td>
            <td className="py-1.5 pl-3">
              <OutcomeBar outcomes={pair.outcomes} />
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
