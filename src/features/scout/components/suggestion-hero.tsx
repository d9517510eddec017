import { Link } from 'react-router-dom';
import { PlateStrip } from '../../../components/plate-strip';
import { DemoMark } from '../../../components/ui/demo-mark';
import type { ScoutResult } from '../../../../shared/schemas/scout';
import { neighbourRfsNear } from './neighbour-spots';

const confidenceLook = {
  high: 'border-clean/40 text-clean',
  medium: 'border-partial/40 text-partial',
  low: 'border-failed/40 text-failed',
} as const;

/** The first plate to run, in big type, with the predicted spot and its interval drawn on a plate strip. */
export function SuggestionHero({ result }: { result: ScoutResult }) {
  const suggestion = result.suggestion;
  if (!suggestion) {
    return (
      <p role="status" className="rounded-plate border border-line bg-surface p-4 text-sm">
        {result.noSuggestion}
      </p>
    );
  }
  const neighbours = neighbourRfsNear(result);
  const [low, high] = suggestion.interval;
  const plate = result.firstPlate;
  return (
    <section
      aria-labelledby="scout-suggestion"
      className="flex flex-wrap items-start gap-6 rounded-plate border border-line bg-surface p-5"
    >
      <PlateStrip
        size="lg"
        title="Predicted plate"
        lanes={[
          { label: suggestion.notation, spots: [], predicted: { rf: suggestion.predictedRf, low, high }, neighbours },
        ]}
      />
      <div className="min-w-0 flex-1 space-y-2">
        <p className="text-xs uppercase tracking-wide text-ink-soft">
          First plate to run · <span className="normal-case">{plate?.phaseName ?? suggestion.phase.name}</span>
        </p>
        <h2 id="scout-suggestion" className="figure break-words text-3xl font-semibold text-ink">
          {plate?.label ?? suggestion.label}
        </h2>
        {plate && (
          <p className="text-base" data-testid="scout-first-plate">
            {plate.summary}{' '}
            {plate.recordId !== null && (
              <Link to={`/records/${plate.recordId}`} className="text-front hover:underline">
                Open record #{plate.recordId}
              </Link>
            )}
            {plate.demo && (
              <>
                {' '}
                <DemoMark />
              </>
            )}
          </p>
        )}
        {plate && plate.notes.length > 0 && (
          <ul className="list-disc pl-5 text-sm">
            {plate.notes.map((note) => (
              <li key={note}>{note}</li>
            ))}
          </ul>
        )}
        <p className="text-lg">
          {plate?.source === 'recorded' ? 'Scout’s estimate (second opinion): ' : 'Expected '}
          {plate?.source === 'recorded' && <span className="figure">{suggestion.label} · </span>}
          Rf <span className="figure font-semibold text-spot-dark">{suggestion.predictedRf.toFixed(2)}</span>{' '}
          <span className="text-sm text-ink-soft">
            (90 % interval{' '}
            <span className="figure">
              {low.toFixed(2)}–{high.toFixed(2)}
            </span>
            ; target {result.targetRf.toFixed(2)})
          </span>
        </p>
        <p className="text-sm text-ink-soft">
          {suggestion.basis === 'descriptors-only'
            ? 'An estimate from descriptors alone: no recorded compound is close.'
            : `From the nearest recorded neighbours and the descriptors of ${result.knowledge.compounds} recorded compounds.`}
          {suggestion.borrowedFrom &&
            ` Nothing recorded in ${suggestion.pair.label}: translated from ${suggestion.borrowedFrom.label} at equal ε°.`}
          {suggestion.reach === 'too-polar' &&
            ' Even the pure strong solvent leaves it below the target: consider a stronger pair.'}
          {suggestion.reach === 'too-fast' &&
            ' Even the weak solvent alone moves it past the target: consider a weaker solvent.'}
        </p>
        <p
          className={
            `inline-flex items-center gap-2 rounded-plate border bg-surface px-2 py-1 text-sm ` +
            `${confidenceLook[result.confidence.level]}`
          }
          data-testid="scout-confidence"
        >
          <strong>Confidence: {result.confidence.level}</strong>
          <span className="figure text-ink-soft">(90 % interval {(high - low).toFixed(2)} Rf wide)</span>
        </p>
        <ul className="list-disc pl-5 text-sm text-ink-soft">
          {result.confidence.reasons.map((reason) => (
            <li key={reason}>{reason}</li>
          ))}
        </ul>
        <p className="text-2xs text-ink-soft figure">
          ε° {suggestion.epsilon.toFixed(3)} (Snyder) · {suggestion.strongPercent.toFixed(1)} % v/v strong solvent
        </p>
      </div>
    </section>
  );
}
