import type { OutcomeCounts } from '../../../../shared/schemas/classes';

const parts = [
  { key: 'clean', label: 'clean', className: 'bg-clean' },
  { key: 'partial', label: 'partial', className: 'bg-partial' },
  { key: 'failed', label: 'failed', className: 'bg-failed' },
] as const;

/** Outcomes as one stacked bar with the counts written beside it (never colour alone). */
export function OutcomeBar({ outcomes }: { outcomes: OutcomeCounts }) {
  const total = outcomes.clean + outcomes.partial + outcomes.failed;
  const words = parts.map((part) => `${outcomes[part.key]} ${part.label}`).join(', ');
  return (
    <div className="flex items-center gap-2">
      <div className="flex h-2 w-28 overflow-hidden rounded-full bg-line" role="img" aria-label={`Outcomes: ${words}`}>
        {total > 0 &&
          parts.map((part) => (
            <span
              key={part.key}
              className={part.className}
              style={{ width: `${(100 * outcomes[part.key]) / total}%` }}
            />
          ))}
      </div>
      <span className="figure text-2xs text-ink-soft" aria-hidden="true">
        {outcomes.clean}/{outcomes.partial}/{outcomes.failed}
      </span>
    </div>
  );
}
