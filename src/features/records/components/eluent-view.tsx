import { solventByKey } from '../../../../shared/catalogue/solvents';
import { additiveByKey } from '../../../../shared/catalogue/additives';
import { formatNumber, formatParts } from '../../../../shared/domain/format-number';
import type { RecordListItem } from '../../../../shared/schemas/record';

const label = (key: string) => solventByKey(key)?.label ?? key;

/** The eluent as parts and as % v/v of each solvent, the strong solvent's share, additives and gradient steps. */
export function EluentView({ record }: { record: Pick<RecordListItem, 'eluent' | 'eluentSummary'> }) {
  const { eluent, eluentSummary } = record;
  const total = eluent.components.reduce((sum, part) => sum + part.parts, 0);
  return (
    <div className="space-y-2 text-sm">
      <p className="figure text-base">{eluentSummary.notation}</p>
      <table className="text-sm">
        <thead className="text-left text-xs text-ink-soft">
          <tr>
            <th className="pr-4 font-normal">Solvent</th>
            <th className="pr-4 font-normal">Parts</th>
            <th className="font-normal">% v/v</th>
          </tr>
        </thead>
        <tbody>
          {eluent.components.map((part) => (
            <tr key={part.solvent}>
              <td className="pr-4">
                {label(part.solvent)}
                {solventByKey(part.solvent)?.name !== label(part.solvent) && (
                  <span className="text-ink-soft"> ({solventByKey(part.solvent)?.name})</span>
                )}
                {eluentSummary.strongSolvent === part.solvent && eluent.components.length > 1 && (
                  <span className="ml-1 text-xs text-front">strong</span>
                )}
              </td>
              <td className="pr-4 figure">{formatParts(part.parts)}</td>
              <td className="figure">{formatNumber((100 * part.parts) / total, 1)}</td>
            </tr>
          ))}
        </tbody>
      </table>
      {eluentSummary.strongPercent !== null && eluent.components.length > 1 && (
        <p className="text-xs text-ink-soft">
          Strong solvent chosen by Snyder’s ε° on the adsorbent (solvent catalogue); % v/v = its parts ÷ all parts.
        </p>
      )}
      {eluent.additives.length > 0 && (
        <p>
          Additives:{' '}
          {eluent.additives.map((item) => (
            <span key={item.additive} className="figure mr-2">
              {formatNumber(item.percent)} % v/v {additiveByKey(item.additive)?.label ?? item.additive}
            </span>
          ))}
        </p>
      )}
      {eluent.mode === 'gradient' && (
        <table className="text-sm">
          <caption className="text-left text-xs text-ink-soft">Gradient, in running order</caption>
          <tbody>
            {eluent.steps.map((step, index) => (
              <tr key={index}>
                <td className="pr-3 figure text-ink-soft">{index + 1}</td>
                <td className="pr-3 figure">
                  {step.components.map((part) => label(part.solvent)).join(' : ')}{' '}
                  {step.components.map((part) => formatParts(part.parts)).join(' : ')}
                </td>
                <td className="figure">
                  {step.columnVolumes !== null ? `${formatParts(step.columnVolumes)} CV` : '—'}
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </div>
  );
}
