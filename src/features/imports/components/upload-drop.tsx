import { useId, useRef, useState, type DragEvent } from 'react';
import { buttonClass } from '../../../components/ui/button';

/** Largest file the server accepts (POST /api/imports answers 413 beyond). */
const MAX_IMPORT_MB = 20;

/** Drop an Excel workbook (.xlsx), CSV or SDF file here, or choose one; the chosen file's name and size are shown. */
export function UploadDrop({
  file,
  onFile,
  disabled,
}: {
  file: File | null;
  onFile: (file: File) => void;
  disabled?: boolean;
}) {
  const [over, setOver] = useState(false);
  const input = useRef<HTMLInputElement>(null);
  const id = useId();
  const drop = (event: DragEvent) => {
    event.preventDefault();
    setOver(false);
    const dropped = event.dataTransfer.files[0];
    if (dropped && !disabled) onFile(dropped);
  };
  return (
    <div
      onDragOver={(event) => {
        event.preventDefault();
        setOver(true);
      }}
      onDragLeave={() => setOver(false)}
      onDrop={drop}
      className={
        `flex flex-wrap items-center gap-4 rounded-plate border-2 border-dashed px-5 py-6 ` +
        `${over ? 'border-front bg-front-light' : 'border-line bg-plate'}`
      }
    >
      <div className="min-w-0 flex-1">
        <p className="font-medium text-ink">{file ? file.name : 'Drop an .xlsx workbook, CSV or SDF file here'}</p>
        <p className="text-sm text-ink-soft">
          {file
            ? `${(file.size / 1024).toFixed(file.size < 10_240 ? 1 : 0)} kB`
            : `Comma, semicolon or tab separated with a header row, or an SD file with data fields. Up to ${MAX_IMPORT_MB} MB.`}
        </p>
      </div>
      <label htmlFor={id} className={`${buttonClass('secondary')} cursor-pointer`}>
        {file ? 'Choose another file' : 'Choose a file'}
      </label>
      <input
        ref={input}
        id={id}
        type="file"
        accept=".csv,.tsv,.txt,.sdf,.sd,.xlsx,text/csv,text/plain,application/vnd.openxmlformats-officedocument.spreadsheetml.sheet"
        className="sr-only"
        disabled={disabled}
        onChange={(event) => {
          const chosen = event.target.files?.[0];
          if (chosen) onFile(chosen);
          if (input.current) input.current.value = '';
        }}
      />
    </div>
  );
}
