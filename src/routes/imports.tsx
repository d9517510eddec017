import { useState } from 'react';
import { IGNORE_COLUMN, repeatableImportFields, type ImportField } from '../../shared/schemas/import';
import { Button } from '../components/ui/button';
import { Card } from '../components/ui/card';
import { PageLoading } from '../components/ui/page-loading';
import { useImport } from '../features/imports/api/import-detail';
import { useImports } from '../features/imports/api/imports-list';
import { usePreviewImport } from '../features/imports/api/preview';
import { useStartImport } from '../features/imports/api/start';
import { ImportHistory } from '../features/imports/components/import-history';
import { ImportProgress } from '../features/imports/components/import-progress';
import { MappingEditor } from '../features/imports/components/mapping-editor';
import { PreviewTable } from '../features/imports/components/preview-table';
import { UploadDrop } from '../features/imports/components/upload-drop';

const delimiterNames: Record<string, string> = { ',': 'comma', ';': 'semicolon', '\t': 'tab' };

/** A mapping change: the chosen field leaves any other column that held it (one column per field). */
function remap(mapping: Record<string, string>, header: string, target: string): Record<string, string> {
  const single = target !== IGNORE_COLUMN && !repeatableImportFields.includes(target as ImportField);
  const next = Object.fromEntries(Object.entries(mapping).map(([other, value]) => [other, single && value === target ? IGNORE_COLUMN : value]));
  return { ...next, [header]: target };
}

/** Import: upload a file, check the preview and the column mapping, commit, follow progress, review past imports. */
export default function ImportsPage() {
  const [file, setFile] = useState<File | null>(null);
  const [mapping, setMapping] = useState<Record<string, string> | undefined>(undefined);
  const [currentId, setCurrentId] = useState<number | null>(null);
  const preview = usePreviewImport();
  const start = useStartImport();
  const current = useImport(currentId);
  const history = useImports();
  const shown = preview.data;

  const choose = (chosen: File) => {
    setFile(chosen);
    setMapping(undefined);
    setCurrentId(null);
    start.reset();
    preview.mutate({ file: chosen });
  };
  const change = (header: string, target: string) => {
    if (!file || !shown) return;
    const next = remap(mapping ?? shown.mapping, header, target);
    setMapping(next);
    preview.mutate({ file, mapping: next });
  };
  const commit = () => file && start.mutate({ file, mapping }, { onSuccess: (started) => setCurrentId(started.id) });

  return (
    <section className="space-y-6">
      <header>
        <h1 className="text-2xl font-semibold">Import</h1>
        <p className="mt-1 max-w-3xl text-sm text-ink-soft">
          Bring a group’s history in from a spreadsheet (CSV, with a header row) or an SD file. Columns are matched to record fields by
          their names and can be changed; every row is checked like a contributed record. Rows that cannot be read are rejected with a
          reason and can be downloaded, fixed and imported again; rows already stored count as duplicates and add nothing.
        </p>
      </header>

      <Card title="1 · File">
        <UploadDrop file={file} onFile={choose} disabled={start.isPending} />
        {preview.error && <p role="alert" className="mt-3 text-sm text-failed">{preview.error.message}</p>}
      </Card>

      {file && (preview.isPending && !shown ? <PageLoading label="Reading the file…" /> : shown && (
        <>
          <Card title="2 · Columns" actions={preview.isPending ? <span className="text-ink-soft">Updating the preview…</span> : null}>
            <p className="mb-3 text-sm text-ink-soft">
              {shown.format === 'sdf' ? 'SD file' : `CSV, ${delimiterNames[shown.delimiter ?? ','] ?? shown.delimiter} separated`}
              {shown.format === 'open-tlc' && ', one column per solvent (volume fractions)'} · <span className="figure">{shown.total}</span> rows
              {shown.blankRows > 0 && <> · <span className="figure">{shown.blankRows}</span> blank rows skipped</>}
            </p>
            <MappingEditor headers={shown.headers} mapping={shown.mapping} onChange={change} disabled={preview.isPending || start.isPending} sample={shown.rows[0]?.values} />
          </Card>

          <Card title={`3 · Preview of the first ${shown.rows.length} rows`}>
            <p className="mb-3 text-sm" data-testid="preview-counts">
              <span className="text-clean">{shown.accepted} would be added</span> · <span className="text-failed">{shown.rejected} rejected</span> ·{' '}
              <span className="text-ink-soft">{shown.duplicates} duplicates</span>
            </p>
            <PreviewTable rows={shown.rows} mapping={shown.mapping} />
            <div className="mt-4 flex flex-wrap items-center gap-3">
              <Button variant="primary" onClick={commit} disabled={start.isPending || preview.isPending || currentId !== null}>
                {start.isPending ? 'Uploading…' : `Import all ${shown.total} rows`}
              </Button>
              {start.error && <p role="alert" className="text-sm text-failed">{start.error.message}</p>}
            </div>
          </Card>
        </>
      ))}

      {current.data && (
        <Card title="Import">
          <ImportProgress item={current.data} />
        </Card>
      )}

      <Card title="Past imports">
        {history.isLoading ? <PageLoading /> : history.error ? <p role="alert" className="text-failed">{history.error.message}</p> : <ImportHistory items={history.data!.items} />}
      </Card>
    </section>
  );
}
