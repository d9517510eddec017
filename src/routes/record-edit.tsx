import { useMemo } from 'react';
import { Link, useNavigate, useParams } from 'react-router-dom';
import { PageLoading } from '../components/ui/page-loading';
import { useRecord } from '../features/records/api/get-record';
import { useUpdateRecord } from '../features/records/api/save-record';
import { RecordForm } from '../features/records/components/record-form';
import { editRecordFormSchema, recordToFormValues } from '../features/records/components/record-form-values';

/** Edit a record (its author, a curator or an admin); the server keeps the differences as a revision. */
export default function RecordEditPage() {
  const id = Number(useParams().id);
  const navigate = useNavigate();
  const { data: record, isLoading, error } = useRecord(id);
  const update = useUpdateRecord();
  const schema = useMemo(
    () => editRecordFormSchema(record?.compound.canonicalSmiles ?? ''),
    [record?.compound.canonicalSmiles],
  );
  if (isLoading) return <PageLoading label="Loading the record…" />;
  if (error || !record)
    return (
      <p role="alert" className="text-failed">
        {error?.message ?? 'Record not found.'}
      </p>
    );
  if (!record.canEdit) {
    return (
      <p role="alert" className="rounded-plate border border-line bg-surface p-4">
        Only the record’s author, a curator or an admin may edit it.{' '}
        <Link className="text-front underline" to={`/records/${id}`}>
          Back to the record
        </Link>
      </p>
    );
  }
  return (
    <section className="space-y-4">
      <header>
        <h1 className="text-2xl font-semibold">
          Edit record <span className="figure">#{record.id}</span>
        </h1>
        <p className="mt-1 text-sm text-ink-soft">
          {record.compound.name ?? record.compound.canonicalSmiles} · every change is kept in the history.
        </p>
      </header>
      <RecordForm
        defaultValues={recordToFormValues(record)}
        schema={schema}
        submitLabel="Save changes"
        withPhotos={false}
        onSave={async (patch) => {
          await update.mutateAsync({ id, patch: { ...patch, expectedRevision: record.revision } });
          navigate(`/records/${id}`, { state: { notice: 'Changes saved.' } });
        }}
      />
    </section>
  );
}
