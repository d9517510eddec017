import { useState, type ReactNode } from 'react';
import { Controller, FormProvider, useForm, useWatch, type Resolver } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import type { z } from 'zod';
import { stationaryPhases } from '../../../../shared/catalogue/stationary-phases';
import { outcomes, techniqueLabels, techniques } from '../../../../shared/schemas/record-parts';
import { StructureInput } from '../../../components/structure-input';
import { Button } from '../../../components/ui/button';
import { SelectField } from '../../../components/ui/select';
import { TextAreaField, TextField } from '../../../components/ui/field';
import { ColumnDetailsFields } from './column-details-fields';
import { EluentBuilder } from './eluent-builder';
import { PhotoDrop } from './photo-drop';
import { SpotsTable } from './spots-table';
import { VisualisationChips } from './visualisation-chips';
import { CautionsFor } from './cautions-for';
import type { RecordFormValues } from './record-form-values';
import { mapServerErrors } from './server-errors';
import { RecentCompounds } from './recent-compounds';

type ReadSpot = Omit<RecordFormValues['spots'][number], 'useDistances' | 'spotDistanceMm' | 'frontDistanceMm'>;

/** What the page's plate reader gets from the form: the chosen photos, and where to put spots and a fraction pool. */
interface PlateReaderSlot {
  files: File[];
  onUseSpots: (spots: ReadSpot[]) => void;
  onUsePool: (summary: string) => void;
}

interface RecordFormProps<Out> {
  /** A plate reader for the chosen photos, supplied by the page (features never import each other). */
  plateReader?: (slot: PlateReaderSlot) => ReactNode;
  defaultValues: RecordFormValues;
  schema: z.ZodType<Out, RecordFormValues>;
  submitLabel: string;
  /** Saves the parsed body; throw the API error to have it mapped onto the fields. */
  onSave: (body: Out, photos: File[]) => Promise<void>;
  /** Offer the photo drop (the record page has its own for existing records). */
  withPhotos?: boolean;
}

/** The condition-record form for contributing and editing: inline checks with the shared schema, server errors on their fields. */
export function RecordForm<Out>({
  defaultValues,
  schema,
  submitLabel,
  onSave,
  withPhotos = true,
  plateReader,
}: RecordFormProps<Out>) {
  const form = useForm<RecordFormValues, unknown, Out>({
    defaultValues,
    resolver: zodResolver(schema as never) as Resolver<RecordFormValues, unknown, Out>,
    mode: 'onBlur',
  });
  const {
    register,
    control,
    handleSubmit,
    setError,
    formState: { errors, isSubmitting },
  } = form;
  const [photos, setPhotos] = useState<File[]>([]);
  const [formMessage, setFormMessage] = useState<string | null>(null);
  const phase = useWatch({ control, name: 'stationaryPhase' });
  const outcome = useWatch({ control, name: 'outcome' });

  const submit = handleSubmit(async (body) => {
    setFormMessage(null);
    try {
      await onSave(body, photos);
    } catch (error) {
      const mapped = mapServerErrors(error);
      for (const field of mapped.fields) setError(field.path as never, { type: 'server', message: field.message });
      setFormMessage(
        mapped.formMessage ??
          (mapped.fields.length > 0 ? 'The server refused some fields; see the messages beside them.' : null),
      );
    }
  });

  return (
    <FormProvider {...form}>
      <form onSubmit={submit} noValidate className="space-y-6" aria-label={submitLabel}>
        <section className="space-y-3 rounded-plate border border-line bg-surface p-4">
          <Controller
            control={control}
            name="structure"
            render={({ field }) => (
              <StructureInput
                value={field.value}
                onChange={(text, parsed) => {
                  field.onChange(text);
                  if (parsed?.name && !form.getValues('name')) form.setValue('name', parsed.name);
                }}
                required
                error={errors.structure?.message}
                defaultMode="paste"
                extra={
                  <RecentCompounds
                    onPick={(smiles, name) => {
                      field.onChange(smiles);
                      if (name && !form.getValues('name')) form.setValue('name', name);
                    }}
                  />
                }
              />
            )}
          />
          <TextField
            label="Compound name"
            hint="Optional; kept as the compound’s name or added to its synonyms."
            className="max-w-md"
            {...register('name')}
          />
        </section>

        <section className="grid grid-cols-1 gap-4 rounded-plate border border-line bg-surface p-4 sm:grid-cols-3">
          <SelectField
            label="Technique"
            options={techniques.map((value) => ({ value, label: techniqueLabels[value] }))}
            {...register('technique')}
          />
          <SelectField
            label="Stationary phase"
            options={stationaryPhases.map((entry) => ({ value: entry.key, label: entry.name }))}
            error={errors.stationaryPhase?.message}
            {...register('stationaryPhase')}
          />
          {phase === 'other' && (
            <TextField
              label="Phase name"
              required
              error={errors.stationaryPhaseOther?.message}
              {...register('stationaryPhaseOther')}
            />
          )}
        </section>

        <section className="space-y-6 rounded-plate border border-line bg-surface p-4">
          <EluentBuilder />
          <SpotsTable />
          <VisualisationChips />
          <CautionsFor />
        </section>

        <section className="grid grid-cols-1 gap-4 rounded-plate border border-line bg-surface p-4 sm:grid-cols-3">
          <SelectField
            label="Outcome"
            options={outcomes.map((value) => ({ value, label: value }))}
            {...register('outcome')}
          />
          <TextAreaField
            label={outcome === 'clean' ? 'Reason or remark' : 'Reason'}
            required={outcome === 'failed'}
            rows={2}
            className="sm:col-span-2"
            hint={outcome === 'failed' ? 'What went wrong: streaking, co-elution, decomposition…' : undefined}
            error={errors.outcomeReason?.message}
            {...register('outcomeReason')}
          />
        </section>

        <section className="rounded-plate border border-line bg-surface p-4">
          <ColumnDetailsFields />
        </section>

        <section className="grid grid-cols-1 gap-4 rounded-plate border border-line bg-surface p-4 sm:grid-cols-3">
          <TextField
            label="Notebook reference"
            placeholder="e.g. AB-03 p. 41"
            mono
            error={errors.notebookRef?.message}
            {...register('notebookRef')}
          />
          <TextField
            label="Plate run on"
            type="date"
            hint="The day you ran the plate, if not today."
            error={errors.runOn?.message}
            {...register('runOn')}
          />
          <TextAreaField
            label="Notes"
            rows={3}
            className="sm:col-span-3"
            error={errors.notes?.message}
            {...register('notes')}
          />
          {withPhotos && (
            <div className="sm:col-span-3">
              <PhotoDrop files={photos} onChange={setPhotos} />
            </div>
          )}
          {withPhotos && plateReader && photos.length > 0 && (
            <div className="sm:col-span-3">
              {plateReader({
                files: photos,
                onUseSpots: (spots) =>
                  form.setValue(
                    'spots',
                    spots.map((spot) => ({
                      ...spot,
                      useDistances: false,
                      spotDistanceMm: null,
                      frontDistanceMm: null,
                    })),
                    { shouldDirty: true },
                  ),
                onUsePool: (summary) => {
                  form.setValue('showColumn', true);
                  form.setValue('column.fractionsPooled', summary, { shouldDirty: true });
                },
              })}
            </div>
          )}
        </section>

        {formMessage && (
          <p role="alert" className="rounded-plate border border-failed/40 bg-surface p-3 text-sm text-failed">
            {formMessage}
          </p>
        )}
        <Button type="submit" variant="primary" disabled={isSubmitting}>
          {isSubmitting ? 'Saving…' : submitLabel}
        </Button>
      </form>
    </FormProvider>
  );
}
