import type { ColumnPlanResult } from '../../../../shared/schemas/tools';
import { formatNumber } from '../../../../shared/domain/format-number';

const flagTone = 'rounded-plate border border-partial/40 bg-spot-light px-3 py-2 text-sm text-ink';

function Figure({ label, value, unit, source }: { label: string; value: string; unit: string; source: string }) {
  return (
    <div className="rounded-plate border border-line px-3 py-2">
      <dt className="text-xs text-ink-soft">{label}</dt>
      <dd>
        <span className="figure text-lg text-ink">{value}</span> <span className="text-sm text-ink-soft">{unit}</span>
        <p className="mt-0.5 text-2xs text-ink-soft">{source}</p>
      </dd>
    </div>
  );
}

/** The plan's numbers with units, each with the line saying where it came from, then advice and flags. */
export function PlanFigures({ plan }: { plan: ColumnPlanResult }) {
  const s = plan.sources;
  return (
    <div className="space-y-3">
      <dl className="grid grid-cols-1 gap-2 sm:grid-cols-2 lg:grid-cols-3">
        <Figure label="Column diameter" value={formatNumber(plan.diameterMm, 0)} unit="mm" source={s.diameterMm} />
        <Figure
          label="Silica"
          value={formatNumber(plan.silicaG, 0)}
          unit={`g (${formatNumber(plan.silicaToSample, 0)} g per g of sample)`}
          source={s.silicaG}
        />
        <Figure
          label="Eluent, packing and elution"
          value={formatNumber(plan.eluentMl, 0)}
          unit="mL"
          source={s.eluentMl}
        />
        <Figure label="Fraction size" value={formatNumber(plan.fractionMl, 0)} unit="mL" source={s.fractionMl} />
        <Figure label="Target elutes after" value={formatNumber(plan.cvTarget, 1)} unit="CV" source={s.cvTarget} />
        <Figure
          label="Band separation"
          value={plan.deltaCv === null ? '—' : formatNumber(plan.deltaCv, 1)}
          unit={plan.deltaCv === null ? 'no other spot given' : `CV (ΔRf ${formatNumber(plan.deltaRf ?? 0, 2)})`}
          source={s.deltaCv}
        />
      </dl>
      <p className="text-sm">
        <strong>Elution ({plan.gradient.mode === 'isocratic' ? 'isocratic' : 'step gradient'}):</strong>{' '}
        {plan.gradient.advice} <span className="text-2xs text-ink-soft">({s.gradient})</span>
      </p>
      <p className="text-sm">
        <strong>Loading ({plan.load.method}):</strong> {plan.load.advice}{' '}
        <span className="text-2xs text-ink-soft">({s.load})</span>
      </p>
      {plan.flags.length > 0 && (
        <ul className="space-y-1" aria-label="Flags">
          {plan.flags.map((flag) => (
            <li key={flag.code} className={flagTone}>
              {flag.message}
            </li>
          ))}
        </ul>
      )}
    </div>
  );
}
