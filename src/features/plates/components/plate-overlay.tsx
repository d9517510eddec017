import { useRef, useState, type PointerEvent } from 'react';
import { rfBetweenLines, type PlatePoint } from '../../../../shared/domain/plate-rf';
import type { PlateAnnotation } from '../../../../shared/schemas/plates';

export type SpotRef = { plate: number; lane: number; spot: number };
type Drag = { kind: 'spot'; ref: SpotRef } | { kind: 'origin' | 'front'; plate: number; end: 0 | 1 };

/** Every spot's Rf recomputed from its position between its plate's origin and front. */
export function withRfs(annotation: PlateAnnotation): PlateAnnotation {
  return {
    ...annotation,
    plates: annotation.plates.map((plate) => ({
      ...plate,
      lanes: plate.lanes.map((lane) => ({
        ...lane,
        spots: lane.spots.map((spot) => {
          const rf = rfBetweenLines([spot.x, spot.y], plate.origin as PlatePoint[], plate.front as PlatePoint[]);
          return { ...spot, rf: rf === null ? spot.rf : Number(rf.toFixed(3)) };
        }),
      })),
    })),
  };
}

interface PlateOverlayProps {
  src: string;
  width: number;
  height: number;
  value: PlateAnnotation;
  onChange: (next: PlateAnnotation) => void;
  selected: SpotRef | null;
  onSelect: (ref: SpotRef | null) => void;
  /** When set, a tap on the photo adds a spot on the nearest lane. */
  adding: boolean;
}

/**
 * The photo with the plates drawn over it as SVG: plate outlines, origin and front lines with a handle at each end,
 * lanes, and spots (a dot, a ring for a pencil circle, a bar for a streak). Handles and spots move by mouse, pen or
 * finger (pointer events, captured while dragging); every Rf is recomputed as they move.
 */
export function PlateOverlay({ src, width, height, value, onChange, selected, onSelect, adding }: PlateOverlayProps) {
  const svg = useRef<SVGSVGElement>(null);
  const [drag, setDrag] = useState<Drag | null>(null);
  const unit = Math.max(width, height) / 70;

  const toImage = (event: PointerEvent): PlatePoint | null => {
    const element = svg.current;
    const matrix = element?.getScreenCTM();
    if (!element || !matrix) return null;
    const point = new DOMPoint(event.clientX, event.clientY).matrixTransform(matrix.inverse());
    return [Math.min(width, Math.max(0, point.x)), Math.min(height, Math.max(0, point.y))];
  };

  const move = (event: PointerEvent) => {
    if (!drag) return;
    const at = toImage(event);
    if (!at) return;
    const next = structuredClone(value);
    if (drag.kind === 'spot') {
      const spot = next.plates[drag.ref.plate].lanes[drag.ref.lane].spots[drag.ref.spot];
      [spot.x, spot.y] = at;
    } else {
      next.plates[drag.plate][drag.kind][drag.end] = at;
    }
    onChange(withRfs(next));
  };

  const start = (event: PointerEvent, next: Drag) => {
    event.stopPropagation();
    (event.target as Element).setPointerCapture?.(event.pointerId);
    setDrag(next);
    if (next.kind === 'spot') onSelect(next.ref);
  };

  const add = (event: PointerEvent) => {
    if (!adding) {
      onSelect(null);
      return;
    }
    const at = toImage(event);
    if (!at || value.plates.length === 0) return;
    let best: { plate: number; lane: number; distance: number } | null = null;
    value.plates.forEach((plate, p) =>
      plate.lanes.forEach((lane, l) => {
        const distance = Math.abs(lane.x - at[0]);
        if (!best || distance < best.distance) best = { plate: p, lane: l, distance };
      }),
    );
    if (!best) return;
    const { plate, lane } = best;
    const next = structuredClone(value);
    next.plates[plate].lanes[lane].spots.push({ x: at[0], y: at[1], rf: 0, kind: 'spot' });
    const spots = next.plates[plate].lanes[lane].spots;
    onChange(withRfs(next));
    onSelect({ plate, lane, spot: spots.length - 1 });
  };

  const handle = (point: number[], label: string, onDown: (event: PointerEvent) => void, colour: string) => (
    <g role="button" aria-label={label} tabIndex={-1} onPointerDown={onDown} className="cursor-grab touch-none">
      <circle cx={point[0]} cy={point[1]} r={unit * 1.6} fill="transparent" />
      <circle cx={point[0]} cy={point[1]} r={unit * 0.55} fill="white" stroke={colour} strokeWidth={unit * 0.25} />
    </g>
  );

  return (
    <div className="relative w-full select-none overflow-hidden rounded-plate border border-line bg-ink">
      <img src={src} alt="Plate photo being marked" className="block h-auto w-full" draggable={false} />
      <svg
        ref={svg}
        viewBox={`0 0 ${width} ${height}`}
        className={`absolute inset-0 h-full w-full touch-none ${adding ? 'cursor-crosshair' : ''}`}
        onPointerMove={move}
        onPointerUp={() => setDrag(null)}
        onPointerCancel={() => setDrag(null)}
        onPointerDown={add}
        data-testid="plate-overlay"
      >
        {value.plates.map((plate, p) => (
          <g key={p}>
            <polygon
              points={plate.corners.map((c) => c.join(',')).join(' ')}
              fill="none"
              stroke="#F6F5F0"
              strokeWidth={unit * 0.2}
              strokeDasharray={`${unit} ${unit * 0.6}`}
            />
            <line
              x1={plate.origin[0][0]}
              y1={plate.origin[0][1]}
              x2={plate.origin[1][0]}
              y2={plate.origin[1][1]}
              stroke="#C77D14"
              strokeWidth={unit * 0.3}
            />
            <line
              x1={plate.front[0][0]}
              y1={plate.front[0][1]}
              x2={plate.front[1][0]}
              y2={plate.front[1][1]}
              stroke="#0F6E6E"
              strokeWidth={unit * 0.3}
            />
            {plate.lanes.map((lane, l) => (
              <g key={l}>
                <text
                  pointerEvents="none"
                  x={lane.x}
                  y={Math.max(plate.origin[0][1], plate.origin[1][1]) + unit * 2.2}
                  fontSize={unit * 1.4}
                  textAnchor="middle"
                  fill="#C77D14"
                  stroke="white"
                  strokeWidth={unit * 0.15}
                  paintOrder="stroke"
                >
                  {lane.label || l + 1}
                </text>
                {lane.spots.map((spot, s) => {
                  const isSelected = selected?.plate === p && selected.lane === l && selected.spot === s;
                  const colour = isSelected ? '#C77D14' : '#F6F5F0';
                  return (
                    <g
                      key={s}
                      role="button"
                      aria-label={`Spot Rf ${spot.rf.toFixed(2)} in lane ${lane.label || l + 1}`}
                      data-rf={spot.rf.toFixed(3)}
                      onPointerDown={(event) => start(event, { kind: 'spot', ref: { plate: p, lane: l, spot: s } })}
                      className="cursor-grab touch-none"
                    >
                      <circle cx={spot.x} cy={spot.y} r={unit * 1.6} fill="transparent" />
                      {spot.kind === 'streak' ? (
                        <rect
                          x={spot.x - unit * 0.5}
                          y={spot.y - unit * 1.5}
                          width={unit}
                          height={unit * 3}
                          fill="none"
                          stroke={colour}
                          strokeWidth={unit * 0.25}
                        />
                      ) : (
                        <circle
                          cx={spot.x}
                          cy={spot.y}
                          r={unit * (spot.kind === 'circle' ? 1.1 : 0.8)}
                          fill={spot.kind === 'circle' ? 'none' : `${colour}55`}
                          stroke={colour}
                          strokeWidth={unit * 0.25}
                        />
                      )}
                      <text
                        pointerEvents="none"
                        x={spot.x + unit * 1.4}
                        y={spot.y + unit * 0.5}
                        fontSize={unit * 1.2}
                        fill={colour}
                        stroke="#22252A"
                        strokeWidth={unit * 0.12}
                        paintOrder="stroke"
                      >
                        {spot.rf.toFixed(2)}
                      </text>
                    </g>
                  );
                })}
              </g>
            ))}
            {([0, 1] as const).map((end) => (
              <g key={end}>
                {handle(
                  plate.origin[end],
                  `Move origin ${end === 0 ? 'left' : 'right'} end`,
                  (event) => start(event, { kind: 'origin', plate: p, end }),
                  '#C77D14',
                )}
                {handle(
                  plate.front[end],
                  `Move front ${end === 0 ? 'left' : 'right'} end`,
                  (event) => start(event, { kind: 'front', plate: p, end }),
                  '#0F6E6E',
                )}
              </g>
            ))}
          </g>
        ))}
      </svg>
    </div>
  );
}
