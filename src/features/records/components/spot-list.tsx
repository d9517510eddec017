import type { SpotDto } from '../../../../shared/schemas/record';
import { spotLaneLabels, spotRoleLabels } from '../../../../shared/schemas/record-parts';

/** The spots as a table: role, Rf, where it came from (typed or measured), lane and label. */
export function SpotList({ spots }: { spots: SpotDto[] }) {
  return (
    <table className="text-sm">
      <thead className="text-left text-xs text-ink-soft">
        <tr>
          <th className="pr-4 font-normal">Spot</th>
          <th className="pr-4 font-normal">Rf</th>
          <th className="pr-4 font-normal">Measured</th>
          <th className="pr-4 font-normal">Lane</th>
          <th className="font-normal">Label</th>
        </tr>
      </thead>
      <tbody>
        {spots.map((spot) => (
          <tr key={spot.id}>
            <td className={`pr-4 ${spot.role === 'target' ? 'font-medium text-spot-dark' : ''}`}>
              {spotRoleLabels[spot.role]}
            </td>
            <td className="pr-4 figure">{spot.rf.toFixed(2)}</td>
            <td className="pr-4 figure text-xs text-ink-soft">
              {spot.spotDistanceMm !== null ? `${spot.spotDistanceMm} mm ÷ ${spot.frontDistanceMm} mm` : 'as entered'}
            </td>
            <td className="pr-4">{spot.lane ? spotLaneLabels[spot.lane] : '—'}</td>
            <td>{spot.label ?? ''}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
