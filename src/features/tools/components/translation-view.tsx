import { solventByKey } from '../../../../shared/catalogue/solvents';
import { additiveByKey } from '../../../../shared/catalogue/additives';
import { formatNumber, formatParts } from '../../../../shared/domain/format-number';
import type { TranslateEluentResult } from '../../../../shared/schemas/tools';

const label = (key: string) => solventByKey(key)?.label ?? key;

/** How sure a handbook value is, in words a reader uses (the catalogue's provenance codes stay internal). */

function Hazards({ title, items }: { title: string; items: TranslateEluentResult['hazards']['source'] }) {
  return (
    <div>
      <h3 className="text-xs font-semibold text-ink-soft">{title}</h3>
      <ul className="mt-1 space-y-1 text-sm">
        {items.map((item) => (
          <li key={item.solvent}>
            <strong>{item.name}</strong>:{' '}
            {item.hazards.map((hazard) => hazard.replace(/-/g, ' ')).join(', ') || 'no listed hazard'}.{' '}
            <span className="text-ink-soft">{item.hazardNote}</span>
          </li>
        ))}
      </ul>
    </div>
  );
}

/** The translated mixture in big figures, ε° of both, warnings, hazards of both sides and greener swaps. */
export function TranslationView({ result }: { result: TranslateEluentResult }) {
  const total = result.target.components.reduce((sum, part) => sum + part.parts, 0);
  const additives = result.additives
    .map((item) => `+ ${formatParts(item.percent)} % ${additiveByKey(item.additive)?.label ?? item.additive}`)
    .join(' ');
  return (
    <div className="space-y-3">
      <p className="text-sm text-ink-soft">
        <span className="figure text-ink">{result.source.description}</span> (ε° {result.source.epsilon.toFixed(3)}) has
        the same strength on {result.adsorbent} as
      </p>
      <p className="figure text-2xl text-ink" data-testid="translated-eluent">
        {result.target.components
          .map((part) => `${formatNumber((100 * part.parts) / total, 1)} % ${label(part.solvent)}`)
          .join(' · ')}{' '}
        {additives}
      </p>
      <p className="text-2xs text-ink-soft">
        ε° {result.target.epsilon.toFixed(3)} · {result.equation} · values:{' '}
        {result.values
          .map(
            (item) =>
              `${item.quantity} ${label(item.solvent)} ${formatNumber(item.value.value, 2)} (${item.value.source})`,
          )
          .join('; ')}
      </p>
      {result.warnings.length > 0 && (
        <ul className="list-disc space-y-1 pl-5 text-sm text-ink">
          {result.warnings.map((warning) => (
            <li key={warning}>{warning}</li>
          ))}
        </ul>
      )}
      <div className="grid grid-cols-1 gap-3 sm:grid-cols-2">
        <Hazards title="Hazards of the source eluent" items={result.hazards.source} />
        <Hazards title="Hazards of the translated eluent" items={result.hazards.target} />
      </div>
      {result.greener.length > 0 && (
        <div>
          <h3 className="text-xs font-semibold text-ink-soft">Greener alternatives (common practice)</h3>
          <ul className="mt-1 space-y-1 text-sm">
            {result.greener.flatMap((item) =>
              item.alternatives.map((alternative) => (
                <li key={`${item.solvent}-${alternative.note}`}>
                  For {item.name}:{' '}
                  <span className="figure">{alternative.solvents.map((part) => label(part.solvent)).join('/')}</span> —{' '}
                  {alternative.note}
                </li>
              )),
            )}
          </ul>
        </div>
      )}
    </div>
  );
}
