import { useNavigate } from 'react-router-dom';
import { useCreateRecord } from '../features/records/api/save-record';
import { useUploadPhoto } from '../features/records/api/photos';
import { RecordForm } from '../features/records/components/record-form';
import { PlateReaderPanel } from '../features/plates/components/plate-reader-panel';
import { createRecordFormSchema, emptyRecordForm } from '../features/records/components/record-form-values';

/** Contribute a condition record: structure, phase, eluent, spots, visualisation, outcome, column, photos. */
export default function ContributePage() {
  const navigate = useNavigate();
  const create = useCreateRecord();
  const upload = useUploadPhoto();
  return (
    <section className="space-y-4">
      <header>
        <h1 className="text-2xl font-semibold">Contribute a record</h1>
        <p className="mt-1 max-w-prose text-sm text-ink-soft">
          What you ran, what the plate showed and how it ended. Failed attempts count: the next person saves a day.
        </p>
      </header>
      <RecordForm
        defaultValues={emptyRecordForm()}
        schema={createRecordFormSchema}
        plateReader={(slot) => <PlateReaderPanel {...slot} />}
        submitLabel="Save record"
        onSave={async (body, photos) => {
          const record = await create.mutateAsync(body);
          const failed: string[] = [];
          for (const file of photos) {
            try {
              await upload.mutateAsync({ recordId: record.id, file });
            } catch (error) {
              failed.push(`${file.name} (${(error as Error).message})`);
            }
          }
          const notice =
            failed.length > 0
              ? `Record saved, but these photos were not: ${failed.join('; ')}. Add them below.`
              : 'Record saved.';
          navigate(`/records/${record.id}`, { state: { notice } });
        }}
      />
    </section>
  );
}
