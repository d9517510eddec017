import { Link } from 'react-router-dom';
import { DemoMark } from '../../../components/ui/demo-mark';
import { StructureImage } from '../../../components/structure-image';
import { OutcomeBadge } from '../../../components/ui/outcome-badge';
import type { Neighbour } from '../../../../shared/schemas/scout';

/** The nearest recorded compounds: depiction, similarity, their share of the prediction and their conditions. */
export function NeighboursTable({ neighbours }: { neighbours: Neighbour[] }) {
  if (neighbours.length === 0) return <p className="text-sm text-ink-soft">No compound has been recorded yet.</p>;
  return (
    <table className="w-full text-sm">
      <caption className="pb-2 text-left text-xs text-ink-soft">
        Similarity: Tanimoto on OpenChemLib fingerprints (0–1). Weight: share of the predicted Rf resting on that
        compound.
      </caption>
      <thead>
        <tr className="border-b border-line text-left text-xs text-ink-soft">
          <th scope="col" className="py-1 pr-3 font-medium">
            Compound
          </th>
          <th scope="col" className="py-1 pr-3 font-medium">
            Similarity
          </th>
          <th scope="col" className="py-1 pr-3 font-medium">
            Weight
          </th>
          <th scope="col" className="py-1 font-medium">
            Recorded conditions
          </th>
        </tr>
      </thead>
      <tbody>
        {neighbours.map((neighbour) => (
          <tr key={neighbour.compoundId} className="border-b border-line/60 align-top">
            <td className="py-2 pr-3">
              <StructureImage compoundId={neighbour.compoundId} name={neighbour.name ?? undefined} size="sm" />
              <Link
                to={`/compounds/${neighbour.compoundId}`}
                className="mt-1 block max-w-40 truncate text-front hover:underline"
              >
                {neighbour.name ?? neighbour.smiles}
              </Link>
            </td>
            <td className="figure py-2 pr-3">{neighbour.similarity.toFixed(2)}</td>
            <td className="figure py-2 pr-3">
              {neighbour.weight === null ? '—' : `${Math.round(100 * neighbour.weight)} %`}
            </td>
            <td className="py-2">
              <ul className="space-y-1">
                {neighbour.conditions.map((condition, index) => (
                  <li key={condition.recordId ?? index} className="flex flex-wrap items-center gap-2">
                    <OutcomeBadge outcome={condition.outcome} />
                    <span className="figure">{condition.notation}</span>
                    {condition.rf !== null && (
                      <span className="figure text-ink-soft">Rf {condition.rf.toFixed(2)}</span>
                    )}
                    {condition.recordId !== null && (
                      <Link to={`/records/${condition.recordId}`} className="text-front hover:underline">
                        record #{condition.recordId}
                      </Link>
                    )}
                    {condition.demo && <DemoMark />}
                    {condition.outcomeReason && (
                      <span className="w-full text-xs text-ink-soft">{condition.outcomeReason}</span>
                    )}
                  </li>
                ))}
              </ul>
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
