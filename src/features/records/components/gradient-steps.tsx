import { useFieldArray, useFormContext, useWatch } from 'react-hook-form';
import { solvents } from '../../../../shared/catalogue/solvents';
import { Button } from '../../../components/ui/button';
import { controlClass } from '../../../components/ui/field';
import type { RecordFormValues } from './record-form-values';
import { FieldError } from './field-error';

const labelOf = (key: string) => solvents.find((solvent) => solvent.key === key)?.label ?? key;

/**
 * Gradient steps in running order: parts of each solvent of the eluent and the column volumes (CV) run at
 * that composition. The eluent's own ratio above is the final composition.
 */
export function GradientSteps() {
  const {
    register,
    control,
    formState: { errors },
  } = useFormContext<RecordFormValues>();
  const steps = useFieldArray({ control, name: 'eluent.steps' });
  const components = useWatch({ control, name: 'eluent.components' });
  return (
    <div className="space-y-2">
      <p className="text-sm font-medium">
        Gradient steps{' '}
        <span className="font-normal text-ink-soft">(parts by volume, then column volumes at that composition)</span>
      </p>
      {steps.fields.length > 0 && (
        <table className="text-sm">
          <thead className="text-left text-xs text-ink-soft">
            <tr>
              <th className="pr-2 font-normal">Step</th>
              {components.map((part, index) => (
                <th key={index} className="pr-2 font-normal">
                  {labelOf(part.solvent)} parts
                </th>
              ))}
              <th className="pr-2 font-normal">CV</th>
              <th />
            </tr>
          </thead>
          <tbody>
            {steps.fields.map((field, stepIndex) => (
              <tr key={field.id}>
                <td className="pr-2 figure">{stepIndex + 1}</td>
                {components.map((part, index) => (
                  <td key={index} className="pr-2 py-1 w-24">
                    <input
                      aria-label={`Step ${stepIndex + 1}, parts of ${labelOf(part.solvent)}`}
                      type="number"
                      step="any"
                      min="0"
                      className={`${controlClass} figure`}
                      {...register(`eluent.steps.${stepIndex}.parts.${index}`, { valueAsNumber: true })}
                    />
                  </td>
                ))}
                <td className="pr-2 py-1 w-24">
                  <input
                    aria-label={`Step ${stepIndex + 1}, column volumes`}
                    type="number"
                    step="any"
                    min="0"
                    className={`${controlClass} figure`}
                    {...register(`eluent.steps.${stepIndex}.columnVolumes`, { valueAsNumber: true })}
                  />
                </td>
                <td>
                  <Button
                    size="sm"
                    variant="quiet"
                    onClick={() => steps.remove(stepIndex)}
                    aria-label={`Remove step ${stepIndex + 1}`}
                  >
                    Remove
                  </Button>
                </td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
      <FieldError error={(errors.eluent?.steps as { message?: string } | undefined) ?? errors.eluent?.steps?.root} />
      <Button
        size="sm"
        disabled={steps.fields.length >= 20}
        onClick={() => steps.append({ parts: components.map((part) => part.parts), columnVolumes: 3 })}
      >
        Add step
      </Button>
    </div>
  );
}
