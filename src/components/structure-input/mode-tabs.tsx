import { useRef, type KeyboardEvent } from 'react';

export type InputMode = 'draw' | 'paste';

const modes: { mode: InputMode; label: string }[] = [
  { mode: 'draw', label: 'Draw' },
  { mode: 'paste', label: 'Paste or file' },
];

export const tabId = (base: string, mode: InputMode) => `${base}-tab-${mode}`;
export const panelId = (base: string, mode: InputMode) => `${base}-panel-${mode}`;

/** Two tabs with arrow-key, Home and End movement (one tab stop, as the ARIA tabs pattern asks). */
export function ModeTabs({
  base,
  active,
  onSelect,
  labelledBy,
}: {
  base: string;
  active: InputMode;
  onSelect: (m: InputMode) => void;
  labelledBy: string;
}) {
  const refs = useRef<Record<InputMode, HTMLButtonElement | null>>({ draw: null, paste: null });
  function onKeyDown(e: KeyboardEvent) {
    const i = modes.findIndex((m) => m.mode === active);
    const next =
      e.key === 'ArrowRight'
        ? (i + 1) % modes.length
        : e.key === 'ArrowLeft'
          ? (i + modes.length - 1) % modes.length
          : e.key === 'Home'
            ? 0
            : e.key === 'End'
              ? modes.length - 1
              : -1;
    if (next < 0) return;
    e.preventDefault();
    onSelect(modes[next].mode);
    refs.current[modes[next].mode]?.focus();
  }
  return (
    <div role="tablist" aria-labelledby={labelledBy} className="flex" onKeyDown={onKeyDown}>
      {modes.map(({ mode, label }) => {
        const selected = mode === active;
        return (
          <button
            key={mode}
            ref={(el) => {
              refs.current[mode] = el;
            }}
            type="button"
            role="tab"
            id={tabId(base, mode)}
            aria-selected={selected}
            aria-controls={panelId(base, mode)}
            tabIndex={selected ? 0 : -1}
            onClick={() => onSelect(mode)}
            className={`-mb-px min-h-10 border-b-2 px-4 text-sm font-medium ${
              selected ? 'border-front text-front-dark' : 'border-transparent text-ink-soft hover:text-ink'
            }`}
          >
            {label}
          </button>
        );
      })}
    </div>
  );
}
