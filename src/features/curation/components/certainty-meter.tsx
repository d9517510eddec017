import { certainty } from './format';

/** How sure a duplicate group is: a short bar and the score in words (see the scoring rules in the page's "how" note). */
export function CertaintyMeter({ score }: { score: number }) {
  return (
    <span
      className="inline-flex items-center gap-2 text-xs text-ink-soft"
      title="How sure: 0–1, from the duplicate rules"
    >
      <span aria-hidden="true" className="inline-block h-1.5 w-16 overflow-hidden rounded-full bg-line">
        <span className="block h-full bg-spot" style={{ width: `${Math.round(score * 100)}%` }} />
      </span>
      <span className="figure">how sure {certainty(score)}</span>
    </span>
  );
}
