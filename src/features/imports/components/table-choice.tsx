import type { ImportChoice, ImportPreview } from '../../../../shared/schemas/import';

const field = 'min-h-6 rounded-plate border border-line bg-paper px-2 py-1 text-sm';

/**
 * Where the table was found — the workbook sheet, the header row, the rows above it that were skipped — and the
 * date column's day/month order, each changeable; a change reads the file again.
 */
export function TableChoice({
  preview,
  choice,
  onChange,
  disabled,
}: {
  preview: ImportPreview;
  choice: ImportChoice;
  onChange: (next: ImportChoice) => void;
  disabled: boolean;
}) {
  const { dates } = preview;
  return (
    <div className="space-y-2 text-sm" data-testid="table-choice">
      <div className="flex flex-wrap items-end gap-4">
        {preview.sheets.length > 0 && (
          <label className="flex flex-col gap-1">
            <span className="text-ink-soft">Sheet</span>
            <select
              className={field}
              value={preview.sheet ?? ''}
              disabled={disabled}
              onChange={(event) => onChange({ ...choice, sheet: event.target.value, headerRow: undefined })}
            >
              {preview.sheets.map((name) => (
                <option key={name} value={name}>
                  {name}
                </option>
              ))}
            </select>
          </label>
        )}
        {preview.format !== 'sdf' && (
          <label className="flex flex-col gap-1">
            <span className="text-ink-soft">Header row</span>
            <input
              key={`${preview.sheet}-${preview.headerRow}`}
              type="number"
              min={1}
              className={`${field} w-24`}
              defaultValue={preview.headerRow}
              disabled={disabled}
              onBlur={(event) => {
                const value = Number(event.target.value);
                if (Number.isInteger(value) && value >= 1 && value !== preview.headerRow)
                  onChange({ ...choice, headerRow: value });
              }}
            />
          </label>
        )}
        {dates.column && (
          <label className="flex flex-col gap-1">
            <span className={dates.needsChoice ? 'font-medium text-partial' : 'text-ink-soft'}>
              Dates in “{dates.column}”
            </span>
            <select
              className={field}
              value={choice.dateOrder ?? dates.order ?? ''}
              disabled={disabled}
              onChange={(event) =>
                onChange({ ...choice, dateOrder: (event.target.value || undefined) as ImportChoice['dateOrder'] })
              }
            >
              <option value="">
                {dates.needsChoice ? 'Choose: the column does not say' : 'as written (no day/month doubt)'}
              </option>
              <option value="dmy">day first (31/12/2021)</option>
              <option value="mdy">month first (12/31/2021)</option>
            </select>
          </label>
        )}
      </div>
      <p className="text-ink-soft">
        {preview.format === 'sdf'
          ? 'Each SD record is a row; its data items are the columns.'
          : `Header found on ${preview.format === 'xlsx' ? 'sheet row' : 'line'} ` +
            `${preview.headerRow}${preview.sheet ? ` of “${preview.sheet}”` : ''}.`}
        {preview.titleRows.length > 0 && ` Skipped above it: ${preview.titleRows.map((row) => `“${row}”`).join(', ')}.`}
        {dates.column &&
          !dates.needsChoice &&
          dates.order &&
          !choice.dateOrder &&
          ` Dates read ${dates.order === 'dmy' ? 'day first' : 'month first'} (${dates.evidence[dates.order]} ` +
            `cell${dates.evidence[dates.order] === 1 ? '' : 's'} can only be read that way).`}
      </p>
      {dates.needsChoice && !choice.dateOrder && (
        <p role="alert" className="text-partial">
          {dates.evidence.ambiguous} date{dates.evidence.ambiguous === 1 ? '' : 's'} could be day/month or month/day.
          Choose the order; until then they are kept as text and the records are dated today.
        </p>
      )}
    </div>
  );
}
