import { spotY, spreadLabels, wrapLabel, type StripGeometry } from './plate-strip-geometry';
import type { PlateLane, PlateSpot } from './plate-strip-types';

const spotClass: Record<PlateSpot['role'], string> = {
  target: 'fill-spot stroke-spot-dark',
  starting_material: 'fill-surface stroke-ink-soft',
  by_product: 'fill-ink-soft stroke-ink-soft',
  unknown: 'fill-ink-soft stroke-ink-soft',
};

/** One lane: silica, origin (pencil line), front, spots, and in the large size figures and a label. */
export function PlateLaneDrawing({ lane, x, g }: { lane: PlateLane; x: number; g: StripGeometry }) {
  const mid = x + g.laneWidth / 2;
  const p = lane.predicted;
  const hasScout = !!p || !!lane.neighbours?.length;
  const spotX = hasScout ? mid - g.laneWidth * 0.14 : mid;
  const figures = g.figureWidth > 0 ? laneFigures(lane, g) : [];
  return (
    <g>
      <rect x={x} y={0.5} width={g.laneWidth} height={g.plateHeight - 1} rx={2} className="fill-plate stroke-line" />
      <line
        data-part="front"
        x1={x + 2}
        x2={x + g.laneWidth - 2}
        y1={g.frontY}
        y2={g.frontY}
        className="stroke-front"
        strokeWidth={1.2}
      />
      <line
        data-part="origin"
        x1={x + 2}
        x2={x + g.laneWidth - 2}
        y1={g.originY}
        y2={g.originY}
        className="stroke-ink-soft"
        strokeDasharray="2 2"
      />
      {p && p.low !== undefined && p.high !== undefined && (
        <rect
          data-part="interval"
          x={x + 3}
          width={g.laneWidth - 6}
          y={spotY(Math.max(p.low, p.high), g)}
          height={Math.max(1, spotY(Math.min(p.low, p.high), g) - spotY(Math.max(p.low, p.high), g))}
          className="fill-spot-light stroke-spot"
          strokeDasharray="3 2"
          strokeWidth={0.8}
        />
      )}
      {lane.neighbours?.map((rf, i) => (
        <ellipse
          key={`n${i}`}
          data-part="neighbour"
          data-rf={rf}
          cx={mid + g.laneWidth * 0.27}
          cy={spotY(rf, g)}
          rx={g.spotRx * 0.6}
          ry={g.spotRy * 0.6}
          className="fill-ink-soft"
          opacity={0.35}
        />
      ))}
      {lane.spots.map((s, i) => (
        <ellipse
          key={i}
          data-part="spot"
          data-role={s.role}
          data-rf={s.rf}
          cx={spotX}
          cy={spotY(s.rf, g)}
          rx={g.spotRx}
          ry={g.spotRy}
          className={spotClass[s.role]}
          strokeWidth={s.role === 'starting_material' ? 1.4 : 0.6}
        />
      ))}
      {p && (
        <g data-part="predicted" data-rf={p.rf}>
          <ellipse
            cx={spotX}
            cy={spotY(p.rf, g)}
            rx={g.spotRx + 2}
            ry={g.spotRy + 2}
            fill="none"
            className="stroke-spot-dark"
            strokeDasharray="2 1.5"
          />
          <ellipse cx={spotX} cy={spotY(p.rf, g)} rx={g.spotRx} ry={g.spotRy} className="fill-spot" opacity={0.85} />
        </g>
      )}
      {figures.map((f, i) => (
        <text
          key={`f${i}`}
          x={x + g.laneWidth + 3}
          y={f.y + 3.5}
          fontSize={g.fontSize}
          fontFamily="IBM Plex Mono, monospace"
          className={f.strong ? 'fill-spot-dark font-semibold' : 'fill-ink-soft'}
          aria-hidden="true"
        >
          {f.text}
        </text>
      ))}
      {g.labelHeight > 0 && lane.label && <LaneLabel label={lane.label} x={x} g={g} />}
    </g>
  );
}

function laneFigures(lane: PlateLane, g: StripGeometry) {
  const items = lane.spots.map((s) => ({ rf: s.rf, text: s.rf.toFixed(2), strong: s.role === 'target' }));
  if (lane.predicted) items.push({ rf: lane.predicted.rf, text: `≈${lane.predicted.rf.toFixed(2)}`, strong: true });
  const ys = spreadLabels(
    items.map((f) => spotY(f.rf, g)),
    g.fontSize + 1,
  );
  return items.map((f, i) => ({ ...f, y: ys[i] }));
}

function LaneLabel({ label, x, g }: { label: string; x: number; g: StripGeometry }) {
  const lines = wrapLabel(label, Math.floor((g.laneWidth + g.figureWidth) / (g.fontSize * 0.62)));
  return (
    <text
      x={x}
      y={g.plateHeight + g.fontSize + 4}
      fontSize={g.fontSize}
      className="fill-ink"
      fontFamily="IBM Plex Mono, monospace"
      aria-hidden="true"
    >
      <title>{label}</title>
      {lines.map((line, i) => (
        <tspan key={i} x={x} dy={i === 0 ? 0 : g.fontSize + 2}>
          {line}
        </tspan>
      ))}
    </text>
  );
}
