import { useFormContext, useWatch } from 'react-hook-form';
import { stains } from '../../../../shared/catalogue/stains';
import { ToggleChip } from '../../../components/ui/chip';
import { TextField } from '../../../components/ui/field';
import type { RecordFormValues } from './record-form-values';
import { FieldError } from './field-error';

/** Visualisation methods as on/off chips (UV, named stains, iodine), plus "other" with a name. */
export function VisualisationChips() {
  const {
    control,
    setValue,
    register,
    formState: { errors },
  } = useFormContext<RecordFormValues>();
  const chosen = useWatch({ control, name: 'visualisation' });
  const toggle = (key: string, on: boolean) =>
    setValue('visualisation', on ? [...chosen, key] : chosen.filter((item) => item !== key), {
      shouldDirty: true,
      shouldValidate: false,
    });
  return (
    <fieldset className="space-y-2">
      <legend className="text-sm font-medium">Visualisation</legend>
      <div className="flex flex-wrap gap-2">
        {[
          ...stains.map((stain) => ({ key: stain.key, label: stain.label, title: `${stain.name}: ${stain.shows}` })),
          { key: 'other', label: 'other', title: 'Another method; name it below' },
        ].map((method) => (
          <ToggleChip
            key={method.key}
            pressed={chosen.includes(method.key)}
            onPressedChange={(on) => toggle(method.key, on)}
            title={method.title}
          >
            {method.label}
          </ToggleChip>
        ))}
      </div>
      {chosen.includes('other') && (
        <TextField label="Other method" {...register('otherVisualisation')} className="max-w-sm" />
      )}
      <FieldError error={(errors.visualisation as { message?: string } | undefined) ?? errors.visualisation?.[0]} />
    </fieldset>
  );
}
