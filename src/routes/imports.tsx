import { useState } from 'react';
import {
  IGNORE_COLUMN,
  repeatableImportFields,
  type ImportChoice,
  type ImportField,
  type ImportPreview,
} from '../../shared/schemas/import';
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
import { TableChoice } from '../features/imports/components/table-choice';
import { UploadDrop } from '../features/imports/components/upload-drop';

const delimiterNames: Record<string, string> = { ',': 'comma', ';': 'semicolon', '\t': 'tab' };

/** A mapping change: the chosen field leaves any other column that held it (one column per field). */
function remap(mapping: Record<string, string>, header: string, target: string): Record<string, string> {
  const single = target !== IGNORE_COLUMN && !repeatableImportFields.includes(target as ImportField);
  const next = Object.fromEntries(
    Object.entries(mapping).map(([other, value]) => [other, single && value === target ? IGNORE_COLUMN : value]),
  );
  return { ...next, [header]: target };
}

/** The import button's words: how many rows will come in (counted over every row of a file up to the checked size). */
function importLabel(shown: ImportPreview): string {
  const coming = shown.accepted;
  const all = shown.checked >= shown.total;
  const rest = [
    shown.rejected ? `${shown.rejected} rejected` : '',
    shown.duplicates ? `${shown.duplicates} already stored` : '',
  ]
    .filter(Boolean)
    .join(', ');
  if (all) return `Import ${coming} of ${shown.total} rows${rest ? ` (${rest})` : ''}`;
  return (
    `Import the file: ${coming} of the first ${shown.checked} rows come in${rest ? ` (${rest})` : ''}, ` +
    `${shown.total - shown.checked} more rows are checked as they import`
  );
}

/** Import: upload a file, check the preview and the column mapping, commit, follow progress, review past imports. */
export default function ImportsPage() {
  const [file, setFile] = useState<File | null>(null);
  const [mapping, setMapping] = useState<Record<string, string> | undefined>(undefined);
  const [choice, setChoice] = useState<ImportChoice>({});
  const [currentId, setCurrentId] = useState<number | null>(null);
  const preview = usePreviewImport();
  const start = useStartImport();
  const history = useImports();
  // A curator who left the page while an import ran finds it here again.
  const runningId = history.data?.items.find((item) => item.status === 'running')?.id ?? null;
  const current = useImport(currentId ?? runningId);
  const shown = preview.data;

  const choose = (chosen: File) => {
    setFile(chosen);
    setMapping(undefined);
    setChoice({});
    setCurrentId(null);
    start.reset();
    preview.mutate({ file: chosen });
  };
  const change = (header: string, target: string) => {
    if (!file || !shown) return;
    const next = remap(mapping ?? shown.mapping, header, target);
    setMapping(next);
    preview.mutate({ file, mapping: next, choice });
  };
  const rechoose = (next: ImportChoice) => {
    if (!file) return;
    setChoice(next);
    setMapping(undefined);
    preview.mutate({ file, choice: next });
  };
  const commit = () =>
    file && start.mutate({ file, mapping, choice }, { onSuccess: (started) => setCurrentId(started.id) });

  return (
    <section className="space-y-6">
      <header>
        <h1 className="text-2xl font-semibold">Import</h1>
        <p className="mt-1 max-w-3xl text-sm text-ink-soft">
          Bring a group’s history in from an Excel workbook (.xlsx), a CSV file or an SD file. The sheet and header row
          that hold the table are found for you and can be changed; columns are matched to record fields by their names
          and can be changed too. A row is rejected only when its structure, Rf or eluent cannot be read; a plate,
          stain, date or note only partly recognised comes in with a warning and its text kept on the record. Rejected
          rows and warnings can be downloaded; rows already stored add nothing.
        </p>
      </header>

      <Card title="1 · File">
        <UploadDrop file={file} onFile={choose} disabled={start.isPending} />
        {preview.error && (
          <p role="alert" className="mt-3 text-sm text-failed">
            {preview.error.message}
          </p>
        )}
      </Card>

      {file &&
        (preview.isPending && !shown ? (
          <PageLoading label="Reading the file…" />
        ) : (
          shown && (
            <>
              <Card
                title="2 · Columns"
                actions={preview.isPending ? <span className="text-ink-soft">Updating the preview…</span> : null}
              >
                <p className="mb-3 text-sm text-ink-soft">
                  {shown.format === 'sdf'
                    ? 'SD file'
                    : shown.format === 'xlsx'
                      ? 'Excel workbook'
                      : `CSV, ${delimiterNames[shown.delimiter ?? ','] ?? shown.delimiter} separated`}
                  {shown.format === 'open-tlc' && ', one column per solvent (volume fractions)'} ·{' '}
                  <span className="figure">{shown.total}</span> rows
                  {shown.blankRows > 0 && (
                    <>
                      {' '}
                      · <span className="figure">{shown.blankRows}</span> blank rows skipped
                    </>
                  )}
                </p>
                <div className="mb-4">
                  <TableChoice
                    preview={shown}
                    choice={choice}
                    onChange={rechoose}
                    disabled={preview.isPending || start.isPending}
                  />
                </div>
                <MappingEditor
                  headers={shown.headers}
                  mapping={shown.mapping}
                  onChange={change}
                  disabled={preview.isPending || start.isPending}
                  sample={shown.rows[0]?.values}
                />
              </Card>

              <Card title={`3 · Preview of the first ${shown.rows.length} rows`}>
                <p className="mb-3 text-sm" data-testid="preview-counts">
                  {shown.checked < shown.total && <>Of the first {shown.checked} rows: </>}
                  <span className="text-clean">{shown.accepted} would be added</span>
                  {shown.warned > 0 && <span className="text-partial"> ({shown.warned} with warnings)</span>} ·{' '}
                  <span className="text-failed">{shown.rejected} rejected</span> ·{' '}
                  <span className="text-ink-soft">{shown.duplicates} duplicates</span>
                </p>
                <PreviewTable rows={shown.rows} mapping={shown.mapping} />
                <div className="mt-4 flex flex-wrap items-center gap-3">
                  <Button
                    variant="primary"
                    onClick={commit}
                    disabled={
                      start.isPending ||
                      preview.isPending ||
                      currentId !== null ||
                      (shown.accepted === 0 && shown.checked >= shown.total)
                    }
                  >
                    {start.isPending ? 'Uploading…' : importLabel(shown)}
                  </Button>
                  {start.error && (
                    <p role="alert" className="text-sm text-failed">
                      {start.error.message}
                    </p>
                  )}
                </div>
              </Card>
            </>
          )
        ))}

      {current.data && (
        <Card title="Import">
          <ImportProgress item={current.data} />
        </Card>
      )}

      <Card title="Past imports">
        {history.isLoading ? (
          <PageLoading />
        ) : history.error ? (
          <p role="alert" className="text-failed">
            {history.error.message}
          </p>
        ) : (
          <ImportHistory items={history.data!.items} />
        )}
      </Card>
    </section>
  );
}
