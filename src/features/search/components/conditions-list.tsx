import { Link } from 'react-router-dom';
import { formatNumber } from '../../../../shared/domain/format-number';
import type { ConditionSummary } from '../../../../shared/schemas/search';
import { OutcomeBadge } from '../../../components/ui/outcome-badge';

/** The conditions of a compound's records, the ones that worked first: eluent (% strong), Rf, stains, outcome. */
export function ConditionsList({ conditions }: { conditions: ConditionSummary[] }) {
  return (
    <ul className="space-y-1.5">
      {conditions.map((condition) => (
        <li key={condition.recordId} className="text-xs">
          <div className="flex flex-wrap items-center gap-x-2 gap-y-0.5">
            <OutcomeBadge outcome={condition.outcome} />
            <Link
              to={`/records/${condition.recordId}`}
              className="inline-block min-h-6 py-0.5 figure text-front hover:underline"
              title={`Open record ${condition.recordId}`}
            >
              {condition.eluent}
            </Link>
          </div>
          <p className="figure mt-0.5 text-ink-soft">
            {condition.strongPercent !== null && condition.strongSolvent
              ? `${formatNumber(condition.strongPercent, 1)} % ${condition.strongSolvent} · `
              : ''}
            Rf {condition.targetRf?.toFixed(2) ?? '—'} · {condition.stationaryPhaseLabel}
            {condition.stains.length > 0 ? ` · ${condition.stains.join(', ')}` : ''}
          </p>
        </li>
      ))}
    </ul>
  );
}
