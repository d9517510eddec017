import { useFieldArray, useFormContext, useWatch } from 'react-hook-form';
import { rfFromDistances } from '../../../../shared/domain/rf';
import { spotLaneLabels, spotLanes, spotRoleLabels, spotRoles } from '../../../../shared/schemas/record-parts';
import { Button } from '../../../components/ui/button';
import { controlClass } from '../../../components/ui/field';
import { emptySpot, type RecordFormValues, type SpotRow } from './record-form-values';
import { FieldError } from './field-error';

/** The Rf the distances give (Rf = spot / front, both in mm from the origin), or why they give none. */
function distancePreview(spot: SpotRow): string {
  if (spot.spotDistanceMm === null || spot.frontDistanceMm === null || Number.isNaN(spot.spotDistanceMm) || Number.isNaN(spot.frontDistanceMm)) return '—';
  const result = rfFromDistances(spot.spotDistanceMm, spot.frontDistanceMm);
  return result.ok ? `Rf ${result.rf.toFixed(2)}` : result.message;
}

/** Spots on the plate: role, Rf (typed, or measured as spot and front distances in mm), lane and a label. */
export function SpotsTable() {
  const { register, control, formState: { errors } } = useFormContext<RecordFormValues>();
  const rows = useFieldArray({ control, name: 'spots' });
  const spots = useWatch({ control, name: 'spots' });
  return (
    <fieldset className="space-y-2">
      <legend className="text-sm font-medium">Spots</legend>
      <p className="text-xs text-ink-soft">Rf = distance of the spot from the origin ÷ distance of the solvent front from the origin; it must lie in (0, 1].</p>
      <div className="overflow-x-auto">
        <table className="w-full text-sm">
          <thead className="text-left text-xs text-ink-soft">
            <tr>
              <th className="pb-1 pr-2 font-normal">Role</th>
              <th className="pb-1 pr-2 font-normal">Rf</th>
              <th className="pb-1 pr-2 font-normal">Lane</th>
              <th className="pb-1 pr-2 font-normal">Label</th>
              <th />
            </tr>
          </thead>
          <tbody>
            {rows.fields.map((field, index) => {
              const spot = spots[index] ?? field;
              const spotErrors = errors.spots?.[index];
              return (
                <tr key={field.id} className="align-top">
                  <td className="py-1 pr-2 w-44">
                    <select aria-label={`Spot ${index + 1} role`} className={`${controlClass} min-h-10`} {...register(`spots.${index}.role`)}>
                      {spotRoles.map((role) => <option key={role} value={role}>{spotRoleLabels[role]}</option>)}
                    </select>
                  </td>
                  <td className="py-1 pr-2 min-w-56">
                    <label className="mb-1 flex items-center gap-1.5 text-xs text-ink-soft">
                      <input type="checkbox" {...register(`spots.${index}.useDistances`)} /> measure distances (mm)
                    </label>
                    {spot.useDistances ? (
                      <div className="flex flex-wrap items-center gap-1">
                        <input aria-label={`Spot ${index + 1} distance from origin (mm)`} placeholder="spot mm" type="number" step="any" className={`${controlClass} figure w-24`}
                          {...register(`spots.${index}.spotDistanceMm`, { valueAsNumber: true })} />
                        <span aria-hidden="true">÷</span>
                        <input aria-label={`Spot ${index + 1} solvent front distance (mm)`} placeholder="front mm" type="number" step="any" className={`${controlClass} figure w-24`}
                          {...register(`spots.${index}.frontDistanceMm`, { valueAsNumber: true })} />
                        <span className="figure text-xs text-ink-soft" aria-live="polite">{distancePreview(spot)}</span>
                      </div>
                    ) : (
                      <div className="w-28">
                        <input aria-label={`Spot ${index + 1} Rf`} type="number" step="0.01" min="0" max="1" className={`${controlClass} figure`}
                          {...register(`spots.${index}.rf`, { valueAsNumber: true })} />
                      </div>
                    )}
                    <FieldError error={spotErrors?.rf ?? spotErrors?.spotDistanceMm ?? spotErrors?.frontDistanceMm} />
                  </td>
                  <td className="py-1 pr-2 w-36">
                    <select aria-label={`Spot ${index + 1} lane`} className={`${controlClass} min-h-10`} {...register(`spots.${index}.lane`)}>
                      <option value="">—</option>
                      {spotLanes.map((lane) => <option key={lane} value={lane}>{spotLaneLabels[lane]}</option>)}
                    </select>
                  </td>
                  <td className="py-1 pr-2">
                    <input aria-label={`Spot ${index + 1} label`} className={controlClass} {...register(`spots.${index}.label`)} />
                  </td>
                  <td className="py-1">
                    <Button size="sm" variant="quiet" disabled={rows.fields.length === 1} onClick={() => rows.remove(index)} aria-label={`Remove spot ${index + 1}`}>Remove</Button>
                  </td>
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <FieldError error={(errors.spots as { message?: string } | undefined) ?? errors.spots?.root} />
      <Button size="sm" disabled={rows.fields.length >= 20} onClick={() => rows.append(emptySpot(spots.some((spot) => spot.role === 'target') ? 'starting_material' : 'target'))}>Add spot</Button>
    </fieldset>
  );
}
