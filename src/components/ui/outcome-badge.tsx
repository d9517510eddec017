import type { outcomes } from '../../../shared/schemas/record-parts';

/** A record's outcome, as the records schema stores it. */
export type Outcome = (typeof outcomes)[number];

const looks: Record<Outcome, { label: string; mark: string; className: string; meaning: string }> = {
  clean: { label: 'Clean', mark: '●', className: 'border-clean/40 text-clean', meaning: 'target isolated pure' },
  partial: {
    label: 'Partial',
    mark: '◐',
    className: 'border-partial/40 text-partial',
    meaning: 'some mixed fractions',
  },
  failed: { label: 'Failed', mark: '✕', className: 'border-failed/40 text-failed', meaning: 'no useful separation' },
};

/** The outcome of a purification as colour, shape and word together — never colour alone. */
export function OutcomeBadge({ outcome }: { outcome: Outcome }) {
  const look = looks[outcome];
  return (
    <span
      title={`Outcome: ${look.label.toLowerCase()} — ${look.meaning}`}
      className={`inline-flex items-center gap-1 rounded-plate border bg-surface px-1.5 py-0.5 text-xs font-medium ${look.className}`}
    >
      <span aria-hidden="true">{look.mark}</span>
      {look.label}
    </span>
  );
}
