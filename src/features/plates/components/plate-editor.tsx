import { useMemo, useState } from 'react';
import { readMonitoringPlate, type MonitorLane } from '../../../../shared/domain/plate-monitoring';
import { proposePooling } from '../../../../shared/domain/plate-pooling';
import {
  annotationLaneRoleLabels,
  annotationLaneRoles,
  annotationSpotRoles,
  type PlateAnnotation,
  type PlateReading,
} from '../../../../shared/schemas/plates';
import { Button } from '../../../components/ui/button';
import { controlClass } from '../../../components/ui/field';
import { PlateOverlay, withRfs, type SpotRef } from './plate-overlay';

/** A spot handed to the record form: the roles and lanes of the record's own spot list. */
export type FormSpot = {
  role: (typeof annotationSpotRoles)[number];
  rf: number;
  lane: 'starting_material' | 'co_spot' | 'mixture' | '';
  label: string;
};

const spotRoleLabels: Record<(typeof annotationSpotRoles)[number], string> = {
  target: 'target',
  starting_material: 'starting material',
  by_product: 'by-product',
  unknown: 'unknown',
};

/** The reader's answer as an annotation to edit: lanes named SM / co-spot / RM for three lanes, fractions for eight or more. */
export function annotationFromReading(reading: PlateReading): PlateAnnotation {
  return withRfs({
    plates: reading.plates.map((plate) => ({
      corners: plate.corners,
      origin: plate.origin,
      front: plate.front,
      lanes: plate.lanes.map((lane, index) => {
        const guess =
          plate.lanes.length === 3
            ? (['starting_material', 'co_spot', 'mixture'] as const)[index]
            : plate.lanes.length >= 6
              ? 'fraction'
              : undefined;
        return {
          x: lane.x,
          role: guess,
          label: guess === 'fraction' ? String(index + 1) : guess ? annotationLaneRoleLabels[guess] : lane.label,
          ...(guess === 'fraction' ? { fraction: index + 1 } : {}),
          spots: lane.spots.map((spot) => ({
            x: spot.x,
            y: spot.y,
            rf: spot.rf,
            kind: spot.kind,
            ...(spot.rfLow !== undefined ? { rfLow: spot.rfLow, rfHigh: spot.rfHigh } : {}),
          })),
        };
      }),
    })),
  });
}

interface PlateEditorProps {
  src: string;
  width: number;
  height: number;
  value: PlateAnnotation;
  onChange: (next: PlateAnnotation) => void;
  onUseSpots?: (spots: FormSpot[]) => void;
  onUsePool?: (summary: string) => void;
}

/** The overlay with what goes around it: lane names and roles, the selected spot's role, and the plate's read-outs. */
/** The column planner, opened with the target's and its nearest neighbour's Rf from this plate. */
function plannerLink({ rfTarget, rfImpurity }: { rfTarget: number; rfImpurity: number | null }): string {
  return `/tools?rfTarget=${rfTarget}${rfImpurity !== null ? `&rfImpurity=${rfImpurity}` : ''}`;
}

export function PlateEditor({ src, width, height, value, onChange, onUseSpots, onUsePool }: PlateEditorProps) {
  const [selected, setSelected] = useState<SpotRef | null>(null);
  const [adding, setAdding] = useState(false);
  const selectedSpot = selected ? value.plates[selected.plate]?.lanes[selected.lane]?.spots[selected.spot] : undefined;
  const update = (change: (draft: PlateAnnotation) => void) => {
    const next = structuredClone(value);
    change(next);
    onChange(withRfs(next));
  };

  const readouts = useMemo(
    () =>
      value.plates.map((plate) => {
        const monitorLanes: MonitorLane[] = plate.lanes
          .filter((lane) => lane.role === 'starting_material' || lane.role === 'co_spot' || lane.role === 'mixture')
          .map((lane) => ({ role: lane.role as MonitorLane['role'], rfs: lane.spots.map((spot) => spot.rf) }));
        const target = plate.lanes.flatMap((lane) => lane.spots).find((spot) => spot.role === 'target')?.rf ?? null;
        const monitoring = monitorLanes.length >= 2 ? readMonitoringPlate(monitorLanes, target) : null;
        const fractions = plate.lanes.filter((lane) => lane.role === 'fraction' && lane.fraction !== undefined);
        const pooling =
          fractions.length >= 2 && target !== null
            ? proposePooling(
                fractions.map((lane) => ({ fraction: lane.fraction!, rfs: lane.spots.map((spot) => spot.rf) })),
                target,
              )
            : null;
        return { monitoring, pooling, fractionsWithoutTarget: fractions.length >= 2 && target === null };
      }),
    [value],
  );

  const formSpots = (): FormSpot[] =>
    value.plates
      .flatMap((plate) => {
        const named = plate.lanes.filter((lane) => lane.role && lane.role !== 'fraction');
        return (named.length ? named : plate.lanes).flatMap((lane) =>
          lane.spots.map((spot): FormSpot => ({
            role: spot.role ?? (lane.role === 'starting_material' ? 'starting_material' : 'unknown'),
            rf: spot.rf,
            lane:
              lane.role === 'starting_material' || lane.role === 'co_spot' || lane.role === 'mixture' ? lane.role : '',
            label: lane.label ?? '',
          })),
        );
      })
      .filter((spot) => spot.rf > 0 && spot.rf <= 1)
      .slice(0, 30);

  return (
    <div className="space-y-3">
      <PlateOverlay
        src={src}
        width={width}
        height={height}
        value={value}
        onChange={onChange}
        selected={selected}
        onSelect={setSelected}
        adding={adding}
      />
      <div className="flex flex-wrap items-center gap-2">
        <Button
          size="sm"
          variant={adding ? 'primary' : 'secondary'}
          onClick={() => setAdding(!adding)}
          aria-pressed={adding}
        >
          {adding ? 'Tap the photo to add a spot' : 'Add a spot'}
        </Button>
        {selected && selectedSpot && (
          <>
            <label className="flex items-center gap-1 text-sm">
              Role
              <select
                aria-label="Selected spot role"
                className={`${controlClass} min-h-8 w-40`}
                value={selectedSpot.role ?? 'unknown'}
                onChange={(event) =>
                  update((draft) => {
                    draft.plates[selected.plate].lanes[selected.lane].spots[selected.spot].role = event.target
                      .value as FormSpot['role'];
                  })
                }
              >
                {annotationSpotRoles.map((role) => (
                  <option key={role} value={role}>
                    {spotRoleLabels[role]}
                  </option>
                ))}
              </select>
            </label>
            <Button
              size="sm"
              variant="danger"
              onClick={() => {
                update((draft) => {
                  draft.plates[selected.plate].lanes[selected.lane].spots.splice(selected.spot, 1);
                });
                setSelected(null);
              }}
            >
              Remove spot
            </Button>
            <span className="figure text-sm">Rf {selectedSpot.rf.toFixed(2)}</span>
          </>
        )}
      </div>
      {value.plates.map((plate, p) => (
        <fieldset key={p} className="space-y-2 rounded-plate border border-line p-3">
          <legend className="px-1 text-sm font-medium">Plate {p + 1}: lanes</legend>
          <ul className="grid gap-2 sm:grid-cols-2">
            {plate.lanes.map((lane, l) => (
              <li key={l} className="flex flex-wrap items-center gap-2 text-sm">
                <span className="figure w-6 text-ink-soft">{l + 1}</span>
                <select
                  aria-label={`Plate ${p + 1} lane ${l + 1} holds`}
                  className={`${controlClass} min-h-8 w-32`}
                  value={lane.role ?? ''}
                  onChange={(event) =>
                    update((draft) => {
                      const target = draft.plates[p].lanes[l];
                      target.role = (event.target.value || undefined) as typeof lane.role;
                      if (target.role === 'fraction') target.fraction = target.fraction ?? l + 1;
                      if (target.role && target.role !== 'fraction' && target.role !== 'other')
                        target.label = annotationLaneRoleLabels[target.role];
                    })
                  }
                >
                  <option value="">—</option>
                  {annotationLaneRoles.map((role) => (
                    <option key={role} value={role}>
                      {annotationLaneRoleLabels[role]}
                    </option>
                  ))}
                </select>
                {lane.role === 'fraction' ? (
                  <input
                    aria-label={`Plate ${p + 1} lane ${l + 1} fraction number`}
                    type="number"
                    min={0}
                    className={`${controlClass} figure min-h-8 w-20`}
                    value={lane.fraction ?? ''}
                    onChange={(event) =>
                      update((draft) => {
                        const n = Number.parseInt(event.target.value, 10);
                        draft.plates[p].lanes[l].fraction = Number.isFinite(n) ? n : undefined;
                        draft.plates[p].lanes[l].label = event.target.value;
                      })
                    }
                  />
                ) : (
                  <input
                    aria-label={`Plate ${p + 1} lane ${l + 1} label`}
                    className={`${controlClass} min-h-8 w-32`}
                    value={lane.label ?? ''}
                    maxLength={40}
                    onChange={(event) =>
                      update((draft) => {
                        draft.plates[p].lanes[l].label = event.target.value;
                      })
                    }
                  />
                )}
                <span className="figure text-xs text-ink-soft">
                  {lane.spots.map((spot) => spot.rf.toFixed(2)).join(' · ') || 'no spot'}
                </span>
              </li>
            ))}
          </ul>
          {readouts[p]?.monitoring && (
            <div className="rounded-plate bg-plate p-2 text-sm" aria-label={`Plate ${p + 1} reaction monitoring`}>
              {readouts[p].monitoring!.sentences.map((sentence) => (
                <p key={sentence}>{sentence}</p>
              ))}
              {readouts[p].monitoring!.columnPlan && (
                <a
                  className="text-front underline underline-offset-2"
                  href={plannerLink(readouts[p].monitoring!.columnPlan!)}
                >
                  Plan the column from these Rf values
                </a>
              )}
            </div>
          )}
          {readouts[p]?.fractionsWithoutTarget && (
            <p className="text-sm text-ink-soft">
              Mark the target spot (select it, role “target”) to see which fractions to pool.
            </p>
          )}
          {readouts[p]?.pooling && (
            <div
              className="flex flex-wrap items-center gap-2 rounded-plate bg-plate p-2 text-sm"
              aria-label={`Plate ${p + 1} fractions to pool`}
            >
              <span className="font-medium">{readouts[p].pooling!.summary}</span>
              {onUsePool && (
                <Button size="sm" onClick={() => onUsePool(readouts[p].pooling!.summary)}>
                  Put in column details
                </Button>
              )}
            </div>
          )}
        </fieldset>
      ))}
      {onUseSpots && (
        <Button variant="primary" size="sm" onClick={() => onUseSpots(formSpots())}>
          Use these Rf values for the spots
        </Button>
      )}
      <p className="text-xs text-ink-soft">
        Caution: UV lamps harm eyes and skin — wear UV-blocking eye protection and do not look into the lamp. Stains
        such as KMnO4, ceric and phosphomolybdic acid dips are oxidising or corrosive and iodine is toxic: follow the
        safety data sheets, your local rules and your safety office.
      </p>
    </div>
  );
}
