import { Link } from 'react-router-dom';
import { DemoMark } from '../../../components/ui/demo-mark';
import type { ScoutResult } from '../../../../shared/schemas/scout';

/** Additives the neighbours needed (with counts) and stains likely to show the compound. */
export function AdditiveList({ additives }: { additives: ScoutResult['additives'] }) {
  if (additives.length === 0)
    return (
      <p className="text-sm text-ink-soft">
        No close neighbour needed an additive, and nothing in the structure calls for one.
      </p>
    );
  return (
    <ul className="space-y-2 text-sm">
      {additives.map((item) => (
        <li key={item.additive}>
          <strong className="figure">
            {item.typicalPercent[0]}–{item.typicalPercent[1]} % {item.label}
          </strong>{' '}
          ({item.purpose}){' '}
          <span className="figure text-ink-soft">
            {item.count} of {item.of}
          </span>
          <p className="text-xs text-ink-soft">
            {item.why}{' '}
            {item.recordIds.slice(0, 5).map((id) => (
              <Link key={id} to={`/records/${id}`} className="mr-1 text-front hover:underline">
                #{id}
              </Link>
            ))}
          </p>
        </li>
      ))}
    </ul>
  );
}

export function StainList({ stains }: { stains: ScoutResult['stains'] }) {
  return (
    <ul className="space-y-2 text-sm">
      {stains.map((item) => (
        <li key={item.stain}>
          <strong>{item.label}</strong> <span className="text-ink-soft">— {item.shows}</span>
          <p className="text-xs text-ink-soft">
            {item.reasons.join('; ')} ({item.source})
          </p>
        </li>
      ))}
    </ul>
  );
}

/** Failed and partial attempts of close neighbours, linked to their records. */
export function WarningList({ warnings }: { warnings: ScoutResult['warnings'] }) {
  if (warnings.length === 0)
    return <p className="text-sm text-ink-soft">No close neighbour has a failed or partial record.</p>;
  return (
    <ul className="space-y-1 text-sm">
      {warnings.map((warning, index) => (
        <li key={warning.recordId ?? index} className={warning.outcome === 'failed' ? 'text-failed' : 'text-partial'}>
          {warning.message}{' '}
          {warning.recordId !== null && (
            <Link to={`/records/${warning.recordId}`} className="text-front hover:underline">
              record #{warning.recordId}
            </Link>
          )}{' '}
          {warning.demo && <DemoMark />}
        </li>
      ))}
    </ul>
  );
}

/** "Why" lines: each number in plain words, with the neighbours, equation or table it came from one click away. */
export function EvidenceList({ evidence }: { evidence: ScoutResult['evidence'] }) {
  return (
    <dl className="space-y-2 text-sm">
      {evidence.map((line) => (
        <div key={line.quantity}>
          <dt className="font-medium text-ink">
            {line.quantity}: <span className="figure">{line.value}</span>
          </dt>
          <dd className="text-xs text-ink-soft">
            <details>
              <summary className="min-h-6 cursor-pointer text-front">How this was worked out</summary>
              <p className="mt-1">{line.source}</p>
            </details>
          </dd>
        </div>
      ))}
    </dl>
  );
}
