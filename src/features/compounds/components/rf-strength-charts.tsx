import { Scatter } from '../../../components/ui/chart';
import { solventByKey } from '../../../../shared/catalogue/solvents';
import { formatNumber } from '../../../../shared/domain/format-number';
import type { RecordListItem } from '../../../../shared/schemas/record';
import { fittedRfAt, rfSeries } from './rf-series';

/** One chart per solvent pair: target Rf against the stronger solvent's % (v/v), with the Soczewiński line when it can be fitted. */
export function RfStrengthCharts({ records }: { records: RecordListItem[] }) {
  const series = rfSeries(records);
  if (series.length === 0)
    return <p className="text-sm text-ink-soft">No two-solvent TLC record with a target spot yet: nothing to chart.</p>;
  return (
    <div className="grid grid-cols-1 gap-4 md:grid-cols-2">
      {series.map((entry) => {
        const maxPercent = Math.max(...entry.points.map((point) => point.percent));
        return (
          <figure key={entry.title} className="space-y-1">
            <Scatter
              title={`Target Rf against % ${entry.title}`}
              x={{
                label: `% ${solventByKey(entry.strong)?.label ?? entry.strong}`,
                unit: '% v/v',
                domain: [0, Math.min(100, Math.max(10, Math.ceil((maxPercent * 1.3) / 10) * 10))],
              }}
              y={{ label: 'target Rf', domain: [0, 1] }}
              points={entry.points.map((point) => ({
                x: point.percent,
                y: point.rf,
                label: `record #${point.recordId}`,
              }))}
              fit={
                entry.fit
                  ? {
                      f: (percent) => fittedRfAt(entry.fit!, percent),
                      label: `Soczewiński fit, R² ${formatNumber(entry.fit.r2, 2)}, n = ${entry.fit.n}`,
                    }
                  : undefined
              }
            />
            <figcaption className="text-xs text-ink-soft">
              {entry.fit
                ? `${entry.fit.equation}; fitted on mole fractions from the recorded volume ratios ` +
                  `(density and molar mass from the solvent catalogue). Estimate — outside ${formatNumber(
                    entry.points.reduce((low, point) => Math.min(low, point.percent), 100),
                    1,
                  )}–${formatNumber(maxPercent, 1)} % it extrapolates.`
                : 'One ratio only: record another ratio to fit a Soczewiński line.'}
            </figcaption>
          </figure>
        );
      })}
    </div>
  );
}
