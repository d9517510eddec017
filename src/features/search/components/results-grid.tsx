import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';
import type { SearchCompoundHit } from '../../../../shared/schemas/search';
import { StructureImage } from '../../../components/structure-image';
import { ConditionsList } from './conditions-list';
import { Score } from './score';

/** Compound hits as cards with large depictions, each with how its records went and the conditions that worked. */
export function ResultsGrid({
  hits,
  action,
}: {
  hits: SearchCompoundHit[];
  action?: (hit: SearchCompoundHit) => ReactNode;
}) {
  return (
    <ul className="grid grid-cols-1 gap-4 sm:grid-cols-2 lg:grid-cols-3" aria-label="Compounds found">
      {hits.map((hit) => {
        const name = hit.compound.name ?? hit.compound.canonicalSmiles;
        return (
          <li key={hit.id} className="flex flex-col gap-3 rounded-plate border border-line bg-surface p-3">
            <div className="flex items-start justify-between gap-2">
              <div className="min-w-0">
                <Link
                  to={`/compounds/${hit.id}`}
                  className="min-h-6 py-0.5 block truncate font-medium text-front hover:underline"
                  title={name}
                >
                  {name}
                </Link>
                <p className="figure text-2xs text-ink-soft">
                  {hit.compound.formula} · {hit.compound.mw.toFixed(2)} g/mol
                </p>
              </div>
              <div className="flex items-center gap-1">
                <Score similarity={hit.similarity} relevance={hit.relevance} />
                {action?.(hit)}
              </div>
            </div>
            <StructureImage compoundId={hit.id} name={name} size="lg" />
            <p className="text-xs text-ink-soft">
              {hit.recordCount} record{hit.recordCount === 1 ? '' : 's'}: {hit.outcomes.clean} clean,{' '}
              {hit.outcomes.partial} partial, {hit.outcomes.failed} failed
            </p>
            <ConditionsList conditions={hit.conditions} />
          </li>
        );
      })}
    </ul>
  );
}
