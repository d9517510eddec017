import type { ImportRowResult } from '../../../../shared/schemas/import';
import { RowResultBadge } from './row-result';

/** The cell of the first column mapped to a field, to show a rejected row by what the sheet says. */
const cellFor = (row: ImportRowResult, mapping: Record<string, string>, field: string) =>
  Object.keys(mapping)
    .filter((header) => mapping[header] === field)
    .map((header) => row.values[header]?.trim())
    .find(Boolean) ?? '';

/**
 * The first rows of the file with what the import would do with each, and why. Notes that hold for every
 * previewed row (a default taken for all of them) are said once above the table.
 */
export function PreviewTable({ rows, mapping }: { rows: ImportRowResult[]; mapping: Record<string, string> }) {
  const withNotes = rows.filter((row) => row.result !== 'rejected' || row.notes.length > 0);
  const common =
    withNotes.length > 1 ? withNotes[0].notes.filter((note) => withNotes.every((row) => row.notes.includes(note))) : [];
  return (
    <div className="overflow-x-auto">
      {common.length > 0 && <p className="mb-2 text-xs text-ink-soft">For every row: {common.join(' ')}</p>}
      <table className="w-full text-sm">
        <caption className="sr-only">Result of each previewed row</caption>
        <thead>
          <tr className="border-b border-line text-left text-ink-soft">
            <th scope="col" className="py-1.5 pr-3 font-medium">
              Row
            </th>
            <th scope="col" className="py-1.5 pr-3 font-medium">
              Result
            </th>
            <th scope="col" className="py-1.5 pr-3 font-medium">
              Compound
            </th>
            <th scope="col" className="py-1.5 pr-3 font-medium">
              Eluent
            </th>
            <th scope="col" className="py-1.5 pr-3 font-medium">
              Rf
            </th>
            <th scope="col" className="py-1.5 font-medium">
              Why / notes
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.row} data-result={row.result} className="border-b border-line/60 align-top last:border-0">
              <td className="figure py-1.5 pr-3 text-ink-soft" title={`line ${row.line} of the file`}>
                {row.row}
              </td>
              <td className="py-1.5 pr-3">
                <RowResultBadge result={row.result} />
              </td>
              <td className="max-w-64 py-1.5 pr-3">
                {row.record ? (
                  <>
                    <span className="text-ink">{row.record.name ?? '(no name)'}</span>
                    <span className="block truncate font-mono text-xs text-ink-soft" title={row.record.smiles ?? ''}>
                      {row.record.smiles}
                    </span>
                  </>
                ) : (
                  <>
                    <span className="text-ink-soft">{cellFor(row, mapping, 'name') || '—'}</span>
                    <span
                      className="block truncate font-mono text-xs text-ink-soft"
                      title={cellFor(row, mapping, 'structure')}
                    >
                      {cellFor(row, mapping, 'structure').split('\n')[0]}
                    </span>
                  </>
                )}
              </td>
              <td className="py-1.5 pr-3 font-mono text-xs">
                {row.record?.eluent ?? <span className="text-ink-soft">{cellFor(row, mapping, 'eluent')}</span>}
              </td>
              <td className="figure py-1.5 pr-3">
                {row.record?.rf ?? <span className="text-ink-soft">{cellFor(row, mapping, 'rf')}</span>}
              </td>
              <td className="py-1.5 text-xs">
                {row.reason && (
                  <p className={row.result === 'rejected' ? 'text-failed' : 'text-ink-soft'}>{row.reason}</p>
                )}
                {row.warnings.length > 0 && (
                  <ul className="text-partial" data-testid="row-warnings">
                    {row.warnings.map((warning) => (
                      <li key={warning}>⚠ {warning}</li>
                    ))}
                  </ul>
                )}
                {row.notes.some((note) => !common.includes(note)) && (
                  <ul className="text-ink-soft">
                    {row.notes
                      .filter((note) => !common.includes(note))
                      .map((note) => (
                        <li key={note}>{note}</li>
                      ))}
                  </ul>
                )}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
