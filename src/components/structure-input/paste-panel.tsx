import { useId } from 'react';
import { controlClass } from '../ui/field';

interface PastePanelProps {
  value: string;
  onChange: (text: string) => void;
  onFile: (file: File) => void;
  required?: boolean;
  invalid: boolean;
  describedBy?: string;
}

const STRUCTURE_FILE_TYPES = '.mol,.sdf,.sd,.smi,.txt,chemical/x-mdl-molfile,chemical/x-mdl-sdfile';

/** The paste tab: a text box for SMILES or a molfile, and a file picker for .mol / .sdf / .smi. */
export function PastePanel({ value, onChange, onFile, required, invalid, describedBy }: PastePanelProps) {
  const id = useId();
  return (
    <div className="flex flex-col gap-2">
      <label htmlFor={`${id}-text`} className="text-sm text-ink-soft">
        SMILES or molfile
      </label>
      <textarea
        id={`${id}-text`}
        value={value}
        onChange={(e) => onChange(e.target.value)}
        rows={looksMultiLine(value) ? 12 : 4}
        spellCheck={false}
        autoCapitalize="off"
        autoCorrect="off"
        required={required}
        aria-required={required}
        aria-invalid={invalid || undefined}
        aria-describedby={describedBy}
        placeholder="e.g. CC(=O)Oc1ccccc1C(=O)O"
        className={`${controlClass} figure text-sm`}
      />
      <div className="flex flex-wrap items-center gap-2 text-sm text-ink-soft">
        <label
          className={
            'inline-flex min-h-10 cursor-pointer items-center rounded-plate border ' +
            'border-line bg-surface px-3 font-medium text-ink hover:bg-plate focus-within:outline-2 focus-within:outline-front'
          }
        >
          Open a file…
          <input
            type="file"
            accept={STRUCTURE_FILE_TYPES}
            className="sr-only"
            onChange={(e) => {
              const file = e.target.files?.[0];
              if (file) onFile(file);
              e.target.value = '';
            }}
          />
        </label>
        <span>or drop a .mol, .sdf or .smi file anywhere on this field (first record is used).</span>
      </div>
    </div>
  );
}

const looksMultiLine = (text: string) => text.includes('\n');
