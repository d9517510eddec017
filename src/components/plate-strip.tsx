import { useId } from 'react';
import { laneX, spotY, stripSize, stripSizes, type StripGeometry } from './plate-strip-geometry';
import { PlateLaneDrawing } from './plate-strip-lane';
import type { PlateLane, SpotRole } from './plate-strip-types';

export type { PlateLane } from './plate-strip-types';

interface PlateStripProps {
  lanes: PlateLane[];
  /** sm for a table row (no labels or figures), lg for a page. */
  size?: 'sm' | 'lg';
  title?: string;
  className?: string;
}

const roleWords: Record<SpotRole, string> = {
  target: 'target',
  starting_material: 'starting material',
  by_product: 'by-product',
  unknown: 'unknown spot',
};
const rf2 = (rf: number) => rf.toFixed(2);

/** One sentence per lane listing every Rf, for screen readers and the hover title. */
function describeLanes(lanes: PlateLane[]): string {
  return lanes
    .map((lane, i) => {
      const parts = lane.spots.map((s) => `${roleWords[s.role]}${s.note ? ` (${s.note})` : ''} Rf ${rf2(s.rf)}`);
      const p = lane.predicted;
      if (p) {
        const interval = p.low !== undefined && p.high !== undefined ? ` (interval ${rf2(p.low)}–${rf2(p.high)})` : '';
        parts.push(`predicted target Rf ${rf2(p.rf)}${interval}`);
      }
      if (lane.neighbours?.length) parts.push(`neighbours Rf ${lane.neighbours.map(rf2).join(', ')}`);
      return `${lane.label ?? `Lane ${i + 1}`}: ${parts.length ? parts.join('; ') : 'no spots recorded'}.`;
    })
    .join(' ');
}

function RfScale({ g }: { g: StripGeometry }) {
  const x = g.axisWidth - 6;
  return (
    <g aria-hidden="true" fontSize={g.fontSize - 1} className="fill-ink-soft" fontFamily="IBM Plex Mono, monospace">
      {[0, 0.5, 1].map((rf) => (
        <g key={rf}>
          <line x1={x} x2={x + 4} y1={spotY(rf, g)} y2={spotY(rf, g)} className="stroke-ink-soft" />
          <text x={x - 2} y={spotY(rf, g) + 3} textAnchor="end">
            {rf === 0.5 ? '.5' : rf}
          </text>
        </g>
      ))}
    </g>
  );
}

/**
 * The plate strip: a drawing of TLC lanes with each spot at its Rf — origin at the bottom, solvent
 * front at the top, the target in amber, starting material hollow, other spots in ink.
 */
export function PlateStrip({ lanes, size = 'sm', title, className = '' }: PlateStripProps) {
  const id = useId();
  const g = stripSizes[size];
  const { width, height } = stripSize(lanes.length, g);
  const heading = title ?? `TLC plate, ${lanes.length} lane${lanes.length === 1 ? '' : 's'}`;
  const description = describeLanes(lanes);
  return (
    <svg
      role="img"
      aria-labelledby={`${id}-t`}
      aria-describedby={`${id}-d`}
      width={width}
      height={height}
      viewBox={`0 0 ${width} ${height}`}
      className={`shrink-0 overflow-visible ${className}`}
    >
      <title id={`${id}-t`}>{heading}</title>
      <desc id={`${id}-d`}>{description}</desc>
      {g.axisWidth > 0 && <RfScale g={g} />}
      {lanes.map((lane, i) => (
        <PlateLaneDrawing key={i} lane={lane} x={laneX(i, g)} g={g} />
      ))}
    </svg>
  );
}
