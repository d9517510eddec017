import { useEffect, useId, useRef, useState, type DragEvent, type ReactNode } from 'react';
import { Button } from '../ui/button';
import { DrawPanel } from './draw-panel';
import { ModeTabs, panelId, tabId, type InputMode } from './mode-tabs';
import { PastePanel } from './paste-panel';
import { ParseStatus } from './parse-status';
import { readStructureFile } from './structure-text';
import { useStructureParse } from './use-structure-parse';
import type { ParsedStructure } from './types';

export interface StructureInputProps {
  /** SMILES or molfile text. */
  value: string;
  /**
   * Called with the new text on every edit (drawing gives a molfile), and once more with the server's
   * parse when the text in the box has been accepted.
   */
  onChange: (text: string, parsed?: ParsedStructure) => void;
  label?: string;
  required?: boolean;
  /** An error from the surrounding form (e.g. the server refused the record's structure). */
  error?: string;
  /** The tab shown first; Draw loads the editor at once, Paste defers it until asked for. */
  defaultMode?: InputMode;
  /** Shown under the paste box, e.g. recent compounds to pick instead of drawing on a phone. */
  extra?: ReactNode;
}

/** The one structure input of the app: draw, paste or drop, with the server's live check beside it. */
export function StructureInput({
  value,
  onChange,
  label = 'Structure',
  required,
  error,
  defaultMode = 'draw',
  extra,
}: StructureInputProps) {
  const base = useId();
  const [mode, setMode] = useState<InputMode>(defaultMode);
  const [drawOpened, setDrawOpened] = useState(defaultMode === 'draw');
  const [dragging, setDragging] = useState(false);
  const [note, setNote] = useState('');
  const check = useStructureParse(value);
  const onChangeRef = useRef(onChange);
  onChangeRef.current = onChange;
  const reported = useRef<ParsedStructure | undefined>(undefined);

  useEffect(() => {
    if (check.isCurrent && check.parsed && reported.current !== check.parsed) {
      reported.current = check.parsed;
      onChangeRef.current(value, check.parsed);
    }
  }, [check.isCurrent, check.parsed, value]);

  const edit = (text: string) => {
    setNote('');
    onChange(text);
  };
  const select = (m: InputMode) => {
    setMode(m);
    if (m === 'draw') setDrawOpened(true);
  };
  async function takeFile(file: File) {
    try {
      const read = await readStructureFile(file);
      onChange(read.text);
      setNote(read.note);
    } catch {
      setNote(`Could not read ${file.name}.`);
    }
  }
  function onDrop(e: DragEvent) {
    e.preventDefault();
    setDragging(false);
    const file = e.dataTransfer.files?.[0];
    const text = e.dataTransfer.getData('text/plain');
    if (file) void takeFile(file);
    else if (text) edit(text);
  }

  const labelId = `${base}-label`;
  const errorId = error ? `${base}-error` : undefined;
  const invalid = !!error || !!check.error;
  return (
    <div role="group" aria-labelledby={labelId} aria-describedby={errorId}>
      <span id={labelId} className="block text-sm font-medium text-ink">
        {label}
        {required && <span className="ml-1 text-xs font-normal text-ink-soft">(required)</span>}
      </span>
      <div
        onDragOver={(e) => {
          e.preventDefault();
          setDragging(true);
        }}
        onDragLeave={() => setDragging(false)}
        onDrop={onDrop}
        className={
          `mt-1 rounded-plate border bg-surface ` +
          `${dragging ? 'border-front ring-2 ring-front/30' : invalid ? 'border-failed/60' : 'border-line'}`
        }
      >
        <div className="flex items-center justify-between gap-2 border-b border-line px-2">
          <ModeTabs base={base} active={mode} onSelect={select} labelledBy={labelId} />
          <Button variant="quiet" size="sm" disabled={!value} onClick={() => edit('')}>
            Clear
          </Button>
        </div>
        <div className="grid grid-cols-1 gap-4 p-3 md:grid-cols-[minmax(0,1fr)_16rem]">
          <div className="relative min-w-0">
            {drawOpened && (
              /* Hidden by visibility, not display: the editor's canvas keeps its size while Paste is shown. */
              <div
                role="tabpanel"
                id={panelId(base, 'draw')}
                aria-labelledby={tabId(base, 'draw')}
                className={mode === 'draw' ? '' : 'invisible absolute inset-x-0 top-0'}
              >
                <p className="mb-2 text-xs text-ink-soft sm:hidden">
                  The editor wants a fine pointer; with a thumb, Paste a SMILES or pick a recent compound.
                </p>
                <DrawPanel value={value} onChange={edit} labelledBy={labelId} />
              </div>
            )}
            <div
              role="tabpanel"
              id={panelId(base, 'paste')}
              aria-labelledby={tabId(base, 'paste')}
              hidden={mode !== 'paste'}
            >
              <PastePanel
                value={value}
                onChange={edit}
                onFile={takeFile}
                required={required}
                invalid={invalid}
                describedBy={errorId}
              />
              {extra}
            </div>
            {note && (
              <p className="mt-2 text-xs text-ink-soft" role="status">
                {note}
              </p>
            )}
          </div>
          <ParseStatus value={value} check={check} />
        </div>
      </div>
      {error && (
        <p id={errorId} className="mt-1 text-sm text-failed">
          {error}
        </p>
      )}
    </div>
  );
}
