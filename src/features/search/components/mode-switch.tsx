import type { SearchMode } from '../../../../shared/schemas/search';

const modes: { mode: SearchMode; label: string; hint: string }[] = [
  {
    mode: 'text',
    label: 'Words',
    hint: 'names, synonyms, notes, notebook references, class names; typos are forgiven',
  },
  {
    mode: 'similar',
    label: 'Similar structure',
    hint: 'compounds ranked by Tanimoto similarity of OpenChemLib fingerprints',
  },
  { mode: 'substructure', label: 'Substructure', hint: 'compounds that contain the drawn or pasted fragment' },
];

/** The three ways to search, as a radio group styled as one segmented control. */
const modeBase =
  'cursor-pointer border-r border-line px-3 py-2 text-sm last:border-r-0 focus-within:outline-2 focus-within:outline-front';

export function ModeSwitch({ mode, onChange }: { mode: SearchMode; onChange: (mode: SearchMode) => void }) {
  return (
    <fieldset className="flex flex-wrap items-center gap-2">
      <legend className="sr-only">Search by</legend>
      <div className="inline-flex overflow-hidden rounded-plate border border-line">
        {modes.map((item) => (
          <label
            key={item.mode}
            title={item.hint}
            className={`${modeBase} ${
              mode === item.mode ? 'bg-front text-white' : 'bg-surface text-ink-soft hover:bg-plate hover:text-ink'
            }`}
          >
            <input
              type="radio"
              name="search-mode"
              value={item.mode}
              checked={mode === item.mode}
              onChange={() => onChange(item.mode)}
              className="sr-only"
            />
            {item.label}
          </label>
        ))}
      </div>
      <span className="text-xs text-ink-soft">{modes.find((item) => item.mode === mode)?.hint}</span>
    </fieldset>
  );
}
