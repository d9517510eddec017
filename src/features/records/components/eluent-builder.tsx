import { useFieldArray, useFormContext, useWatch } from 'react-hook-form';
import { solvents } from '../../../../shared/catalogue/solvents';
import { additives } from '../../../../shared/catalogue/additives';
import { eluentSummary } from '../../../../shared/domain/eluent-summary';
import { formatNumber } from '../../../../shared/domain/format-number';
import { Button } from '../../../components/ui/button';
import { controlClass } from '../../../components/ui/field';
import type { RecordFormValues } from './record-form-values';
import { GradientSteps } from './gradient-steps';
import { FieldError } from './field-error';

const solventOptions = solvents.map((solvent) => ({ value: solvent.key, label: `${solvent.label} — ${solvent.name}` }));
const additiveOptions = additives.map((additive) => ({
  value: additive.key,
  label: `${additive.label} — ${additive.name}`,
}));
const valid = (value: number | null) => value !== null && Number.isFinite(value) && value > 0;

/** The notation and % strong solvent of what is typed so far, or null while a part is missing. */
export function liveSummary(eluent: RecordFormValues['eluent'], phase: string) {
  if (!eluent.components.every((part) => part.solvent && valid(part.parts))) return null;
  const components = eluent.components.map((part) => ({ solvent: part.solvent, parts: part.parts as number }));
  const additiveList = eluent.additives
    .filter((item) => item.additive && valid(item.percent))
    .map((item) => ({ additive: item.additive, percent: item.percent as number }));
  return eluentSummary({ components, additives: additiveList, mode: 'isocratic', steps: [] }, phase);
}

/**
 * Eluent builder: solvents with parts by volume, each shown as % v/v, the notation and the strong solvent's
 * share; additives in % v/v; isocratic or gradient steps with column volumes.
 */
export function EluentBuilder() {
  const {
    register,
    control,
    formState: { errors },
  } = useFormContext<RecordFormValues>();
  const components = useFieldArray({ control, name: 'eluent.components' });
  const additiveRows = useFieldArray({ control, name: 'eluent.additives' });
  const eluent = useWatch({ control, name: 'eluent' });
  const phase = useWatch({ control, name: 'stationaryPhase' });
  const total = eluent.components.reduce((sum, part) => sum + (valid(part.parts) ? (part.parts as number) : 0), 0);
  const summary = liveSummary(eluent, phase);
  const solventLabel = (key: string | null) => solvents.find((solvent) => solvent.key === key)?.label ?? key;

  return (
    <fieldset className="space-y-3">
      <legend className="text-sm font-medium">Eluent</legend>
      <div className="flex gap-4 text-sm" role="radiogroup" aria-label="Elution mode">
        {(['isocratic', 'gradient'] as const).map((mode) => (
          <label key={mode} className="flex min-h-6 items-center gap-1.5">
            <input type="radio" value={mode} {...register('eluent.mode')} />
            {mode}
          </label>
        ))}
      </div>
      <div className="space-y-2 text-sm">
        <p
          aria-hidden="true"
          className={
            'grid grid-cols-[minmax(0,1fr)_5.5rem_3.5rem_auto] gap-2 text-xs text-ink-soft ' +
            'sm:grid-cols-[minmax(0,1fr)_8rem_5rem_5rem]'
          }
        >
          <span>Solvent</span>
          <span>Parts by volume</span>
          <span>% v/v</span>
          <span />
        </p>
        {components.fields.map((field, index) => {
          const parts = eluent.components[index]?.parts ?? null;
          return (
            <div
              key={field.id}
              role="group"
              aria-label={`Solvent ${index + 1} of the eluent`}
              className="grid grid-cols-[minmax(0,1fr)_5.5rem_3.5rem_auto] items-start gap-2 sm:grid-cols-[minmax(0,1fr)_8rem_5rem_5rem]"
            >
              <div className="min-w-0">
                <select
                  aria-label={`Solvent ${index + 1}`}
                  className={`${controlClass} min-h-10`}
                  {...register(`eluent.components.${index}.solvent`)}
                >
                  {solventOptions.map((option) => (
                    <option key={option.value} value={option.value}>
                      {option.label}
                    </option>
                  ))}
                </select>
                <FieldError error={errors.eluent?.components?.[index]?.solvent} />
              </div>
              <div>
                <input
                  aria-label={`Parts of solvent ${index + 1}`}
                  type="number"
                  inputMode="decimal"
                  step="any"
                  min="0"
                  className={`${controlClass} figure`}
                  {...register(`eluent.components.${index}.parts`, { valueAsNumber: true })}
                />
                <FieldError error={errors.eluent?.components?.[index]?.parts} />
              </div>
              <span className="figure py-2 text-ink-soft" aria-live="polite">
                {valid(parts) && total > 0 ? `${formatNumber((100 * (parts as number)) / total, 1)} %` : '—'}
              </span>
              <Button
                size="sm"
                variant="quiet"
                disabled={components.fields.length === 1}
                onClick={() => components.remove(index)}
                aria-label={`Remove solvent ${index + 1}`}
              >
                Remove
              </Button>
            </div>
          );
        })}
      </div>
      <FieldError
        error={errors.eluent?.components?.root ?? (errors.eluent?.components as { message?: string } | undefined)}
      />
      <div className="flex flex-wrap items-center gap-3">
        <Button
          size="sm"
          disabled={components.fields.length >= 4}
          onClick={() => components.append({ solvent: 'dichloromethane', parts: 1 })}
        >
          Add solvent
        </Button>
        <p className="text-sm" data-testid="eluent-summary">
          {summary ? (
            <>
              <span className="figure">{summary.notation}</span>
              {summary.strongSolvent && summary.strongPercent !== null && eluent.components.length > 1 && (
                <span className="text-ink-soft">
                  {' '}
                  · <span className="figure">{formatNumber(summary.strongPercent, 1)} %</span>{' '}
                  {solventLabel(summary.strongSolvent)} (the stronger solvent, by Snyder’s ε°)
                </span>
              )}
            </>
          ) : (
            <span className="text-ink-soft">Give every solvent a positive number of parts.</span>
          )}
        </p>
      </div>

      <div className="space-y-2">
        <p className="text-sm font-medium">
          Additives <span className="font-normal text-ink-soft">(% v/v of the eluent)</span>
        </p>
        {additiveRows.fields.map((field, index) => (
          <div key={field.id} className="flex flex-wrap items-start gap-2">
            <select
              aria-label={`Additive ${index + 1}`}
              className={`${controlClass} min-h-10 max-w-xs`}
              {...register(`eluent.additives.${index}.additive`)}
            >
              {additiveOptions.map((option) => (
                <option key={option.value} value={option.value}>
                  {option.label}
                </option>
              ))}
            </select>
            <div className="w-28">
              <input
                aria-label={`Percent of additive ${index + 1}`}
                type="number"
                step="any"
                min="0"
                className={`${controlClass} figure`}
                {...register(`eluent.additives.${index}.percent`, { valueAsNumber: true })}
              />
              <FieldError error={errors.eluent?.additives?.[index]?.percent} />
            </div>
            <Button
              size="sm"
              variant="quiet"
              onClick={() => additiveRows.remove(index)}
              aria-label={`Remove additive ${index + 1}`}
            >
              Remove
            </Button>
          </div>
        ))}
        <Button
          size="sm"
          disabled={additiveRows.fields.length >= 4}
          onClick={() => additiveRows.append({ additive: 'triethylamine', percent: 1 })}
        >
          Add additive
        </Button>
      </div>

      {eluent.mode === 'gradient' && <GradientSteps />}
    </fieldset>
  );
}
