import { useFieldArray, useFormContext, useWatch } from 'react-hook-form';
import { rfFromDistances } from '../../../../shared/domain/rf';
import { spotLaneLabels, spotLanes, spotRoleLabels, spotRoles } from '../../../../shared/schemas/record-parts';
import { Button } from '../../../components/ui/button';
import { controlClass } from '../../../components/ui/field';
import { emptySpot, type RecordFormValues, type SpotRow } from './record-form-values';
import { FieldError } from './field-error';
import { RfStillHolds } from './rf-still-holds';

/** The Rf the distances give (Rf = spot / front, both in mm from the origin), or why they give none. */
function distancePreview(spot: SpotRow): string {
  if (
    spot.spotDistanceMm === null ||
    spot.frontDistanceMm === null ||
    Number.isNaN(spot.spotDistanceMm) ||
    Number.isNaN(spot.frontDistanceMm)
  )
    return '—';
  const result = rfFromDistances(spot.spotDistanceMm, spot.frontDistanceMm);
  return result.ok ? `Rf ${result.rf.toFixed(2)}` : result.message;
}

/** Spots on the plate: role, Rf (typed, or measured as spot and front distances in mm), lane and a label. */
export function SpotsTable() {
  const {
    register,
    control,
    formState: { errors },
  } = useFormContext<RecordFormValues>();
  const rows = useFieldArray({ control, name: 'spots' });
  const spots = useWatch({ control, name: 'spots' });
  return (
    <fieldset className="space-y-2">
      <legend className="text-sm font-medium">Spots</legend>
      <p className="text-xs text-ink-soft">
        Rf = distance of the spot from the origin ÷ distance of the solvent front from the origin; it must lie in (0,
        1].
      </p>
      <RfStillHolds />
      <ol className="space-y-2">
        {rows.fields.map((field, index) => {
          const spot = spots[index] ?? field;
          const spotErrors = errors.spots?.[index];
          return (
            <li
              key={field.id}
              className={
                'grid grid-cols-2 items-start gap-2 rounded-plate border border-line/70 p-2 ' +
                'sm:grid-cols-[11rem_minmax(14rem,1fr)_9rem_minmax(6rem,1fr)_auto] sm:border-0 sm:p-0'
              }
            >
              <label className="text-xs text-ink-soft">
                <span className={index === 0 ? '' : 'sm:sr-only'}>Role</span>
                <select
                  aria-label={`Spot ${index + 1} role`}
                  className={`${controlClass} mt-0.5 min-h-10 text-sm text-ink`}
                  {...register(`spots.${index}.role`)}
                >
                  {spotRoles.map((role) => (
                    <option key={role} value={role}>
                      {spotRoleLabels[role]}
                    </option>
                  ))}
                </select>
              </label>
              <div className="col-span-2 row-start-2 sm:col-span-1 sm:row-start-auto">
                <label className="mb-1 flex min-h-6 items-center gap-1.5 text-xs text-ink-soft">
                  <input type="checkbox" {...register(`spots.${index}.useDistances`)} /> measure distances (mm)
                </label>
                {spot.useDistances ? (
                  <div className="flex flex-wrap items-center gap-1">
                    <input
                      aria-label={`Spot ${index + 1} distance from origin (mm)`}
                      placeholder="spot mm"
                      type="number"
                      inputMode="decimal"
                      step="any"
                      className={`${controlClass} figure w-24`}
                      {...register(`spots.${index}.spotDistanceMm`, { valueAsNumber: true })}
                    />
                    <span aria-hidden="true">÷</span>
                    <input
                      aria-label={`Spot ${index + 1} solvent front distance (mm)`}
                      placeholder="front mm"
                      type="number"
                      inputMode="decimal"
                      step="any"
                      className={`${controlClass} figure w-24`}
                      {...register(`spots.${index}.frontDistanceMm`, { valueAsNumber: true })}
                    />
                    <span className="figure text-xs text-ink-soft" aria-live="polite">
                      {distancePreview(spot)}
                    </span>
                  </div>
                ) : (
                  <div className="w-28">
                    <input
                      aria-label={`Spot ${index + 1} Rf`}
                      placeholder="Rf"
                      type="number"
                      inputMode="decimal"
                      step="0.01"
                      min="0"
                      max="1"
                      className={`${controlClass} figure`}
                      {...register(`spots.${index}.rf`, { valueAsNumber: true })}
                    />
                  </div>
                )}
                <FieldError error={spotErrors?.rf ?? spotErrors?.spotDistanceMm ?? spotErrors?.frontDistanceMm} />
              </div>
              <label className="text-xs text-ink-soft">
                <span className={index === 0 ? '' : 'sm:sr-only'}>Lane</span>
                <select
                  aria-label={`Spot ${index + 1} lane`}
                  className={`${controlClass} mt-0.5 min-h-10 text-sm text-ink`}
                  {...register(`spots.${index}.lane`)}
                >
                  <option value="">—</option>
                  {spotLanes.map((lane) => (
                    <option key={lane} value={lane}>
                      {spotLaneLabels[lane]}
                    </option>
                  ))}
                </select>
              </label>
              <label className="text-xs text-ink-soft">
                <span className={index === 0 ? '' : 'sm:sr-only'}>Label</span>
                <input
                  aria-label={`Spot ${index + 1} label`}
                  className={`${controlClass} mt-0.5 text-sm text-ink`}
                  {...register(`spots.${index}.label`)}
                />
              </label>
              <div className="self-end">
                <Button
                  size="sm"
                  variant="quiet"
                  disabled={rows.fields.length === 1}
                  onClick={() => rows.remove(index)}
                  aria-label={`Remove spot ${index + 1}`}
                >
                  Remove
                </Button>
              </div>
            </li>
          );
        })}
      </ol>
      <FieldError error={(errors.spots as { message?: string } | undefined) ?? errors.spots?.root} />
      <Button
        size="sm"
        disabled={rows.fields.length >= 20}
        onClick={() =>
          rows.append(emptySpot(spots.some((spot) => spot.role === 'target') ? 'starting_material' : 'target'))
        }
      >
        Add spot
      </Button>
    </fieldset>
  );
}
