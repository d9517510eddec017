import { useId } from 'react';
import { solvents } from '../../../../shared/catalogue/solvents';
import { IGNORE_COLUMN, importFieldLabels, importFields } from '../../../../shared/schemas/import';
import { controlClass } from '../../../components/ui/field';

interface MappingEditorProps {
  headers: string[];
  mapping: Record<string, string>;
  onChange: (header: string, target: string) => void;
  disabled?: boolean;
  /** A cell of the first row under each header, to recognise the column. */
  sample?: Record<string, string>;
}

function ColumnSelect({
  header,
  value,
  onChange,
  disabled,
}: {
  header: string;
  value: string;
  onChange: (target: string) => void;
  disabled?: boolean;
}) {
  const id = useId();
  return (
    <>
      <label htmlFor={id} className="sr-only">{`Field for column "${header}"`}</label>
      <select
        id={id}
        value={value}
        disabled={disabled}
        onChange={(event) => onChange(event.target.value)}
        className={`${controlClass} min-h-9 py-1 text-sm`}
      >
        <option value={IGNORE_COLUMN}>ignore this column</option>
        <optgroup label="Record fields">
          {importFields.map((field) => (
            <option key={field} value={field}>
              {importFieldLabels[field]}
            </option>
          ))}
        </optgroup>
        <optgroup label="Amount of one solvent (fraction, % or parts)">
          {solvents.map((solvent) => (
            <option key={solvent.key} value={`solvent:${solvent.key}`}>
              {solvent.name}
            </option>
          ))}
        </optgroup>
      </select>
    </>
  );
}

/** One line per column of the file: its header, a sample cell and the field it fills (detected, changeable). */
export function MappingEditor({ headers, mapping, onChange, disabled, sample }: MappingEditorProps) {
  return (
    <table className="w-full text-sm">
      <caption className="sr-only">Columns of the file and the fields they fill</caption>
      <thead>
        <tr className="border-b border-line text-left text-ink-soft">
          <th scope="col" className="py-1.5 pr-3 font-medium">
            Column in the file
          </th>
          <th scope="col" className="py-1.5 pr-3 font-medium">
            First row
          </th>
          <th scope="col" className="py-1.5 font-medium">
            Imported as
          </th>
        </tr>
      </thead>
      <tbody>
        {headers.map((header) => (
          <tr key={header} className="border-b border-line/60 last:border-0">
            <th scope="row" className="py-1.5 pr-3 text-left font-medium text-ink">
              {header}
            </th>
            <td className="max-w-56 truncate py-1.5 pr-3 font-mono text-xs text-ink-soft" title={sample?.[header]}>
              {sample?.[header]?.split('\n')[0] ?? ''}
            </td>
            <td className="w-72 py-1">
              <ColumnSelect
                header={header}
                value={mapping[header] ?? IGNORE_COLUMN}
                onChange={(target) => onChange(header, target)}
                disabled={disabled}
              />
            </td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
