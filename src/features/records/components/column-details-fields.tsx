import { useFormContext, useWatch } from 'react-hook-form';
import { Field, TextField, controlClass } from '../../../components/ui/field';
import type { RecordFormValues } from './record-form-values';

type NumberKey = 'diameterMm' | 'silicaG' | 'sampleMg' | 'fractionMl' | 'yieldPercent';
const numberFields: { key: NumberKey; label: string; unit: string }[] = [
  { key: 'diameterMm', label: 'Column diameter', unit: 'mm' },
  { key: 'silicaG', label: 'Silica', unit: 'g' },
  { key: 'sampleMg', label: 'Sample', unit: 'mg' },
  { key: 'fractionMl', label: 'Fraction size', unit: 'mL' },
  { key: 'yieldPercent', label: 'Yield', unit: '%' },
];

/** Flash-column details, shown when asked for (always for flash columns). Units in every label. */
export function ColumnDetailsFields() {
  const {
    register,
    control,
    formState: { errors },
  } = useFormContext<RecordFormValues>();
  const show = useWatch({ control, name: 'showColumn' });
  const columnErrors = errors.column;
  return (
    <fieldset className="space-y-3">
      <legend className="text-sm font-medium">Column details</legend>
      <label className="flex items-center gap-2 text-sm">
        <input type="checkbox" {...register('showColumn')} /> Record column details
      </label>
      {show && (
        <div className="grid grid-cols-1 gap-3 sm:grid-cols-2 lg:grid-cols-3">
          {numberFields.map((field) => (
            <TextField
              key={field.key}
              label={`${field.label} (${field.unit})`}
              type="number"
              step="any"
              min="0"
              mono
              error={columnErrors?.[field.key]?.message}
              {...register(`column.${field.key}`, { valueAsNumber: true })}
            />
          ))}
          <TextField
            label="Cartridge size"
            placeholder="e.g. 24 g"
            error={columnErrors?.cartridgeSize?.message}
            {...register('column.cartridgeSize')}
          />
          <Field label="Load">
            {(ids) => (
              <select {...ids} className={`${controlClass} min-h-10`} {...register('column.loadMethod')}>
                <option value="">—</option>
                <option value="dry">dry load</option>
                <option value="liquid">liquid load</option>
              </select>
            )}
          </Field>
          <TextField label="Fractions pooled" placeholder="e.g. 12–18" {...register('column.fractionsPooled')} />
          <TextField label="Purity note" className="sm:col-span-2" {...register('column.purityNote')} />
        </div>
      )}
    </fieldset>
  );
}
