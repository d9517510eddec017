import { useEffect, useState, type FormEvent } from 'react';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { StructureInput, type ParsedStructure } from '../../../components/structure-input';
import { DEFAULT_SIMILARITY_THRESHOLD, type SearchMode } from '../../../../shared/schemas/search';
import type { SearchState } from '../hooks/use-search-url';
import { ModeSwitch } from './mode-switch';

interface SearchFormProps {
  state: SearchState;
  onSearch: (changes: {
    mode: SearchMode;
    q: string | null;
    structure: string | null;
    threshold: string | null;
  }) => void;
}

/** Text with no spaces made of SMILES characters and holding a bond, branch, ring or bracket mark (a guess, only to offer a switch). */
const looksLikeSmiles = (text: string) =>
  text.length > 3 &&
  /^[A-Za-z0-9@+\-[\]()=#\\/%.]+$/.test(text) &&
  /[=#()[\]]|[a-z]\d|\d[a-z]/i.test(text) &&
  !/^[A-Za-z]+-\d+$/.test(text);

/**
 * The one search box: words, or a structure (drawn, pasted or dropped) for a similarity or substructure
 * search — the words then narrow the structure's hits. A structure the server has read goes into the URL
 * as its canonical SMILES, so the link stays short and reproduces the search.
 */
export function SearchForm({ state, onSearch }: SearchFormProps) {
  const [mode, setMode] = useState(state.mode);
  const [text, setText] = useState(state.q);
  const [structure, setStructure] = useState(state.structure);
  const [parsed, setParsed] = useState<{ text: string; smiles: string } | null>(null);
  const [threshold, setThreshold] = useState(state.threshold || String(DEFAULT_SIMILARITY_THRESHOLD));
  useEffect(() => setMode(state.mode), [state.mode]);
  useEffect(() => setText(state.q), [state.q]);
  useEffect(() => setStructure(state.structure), [state.structure]);

  const structureToSend = parsed && parsed.text === structure ? parsed.smiles : structure.trim() ? structure : '';
  const submitWith = (nextMode: SearchMode) =>
    onSearch({
      mode: nextMode,
      q: text.trim() || null,
      structure: nextMode === 'text' ? null : structureToSend || null,
      threshold: nextMode === 'similar' ? threshold : null,
    });
  const submit = (event: FormEvent) => {
    event.preventDefault();
    submitWith(mode);
  };
  const changeMode = (next: SearchMode) => {
    setMode(next);
    if (next === 'text' || structureToSend) submitWith(next);
  };
  const onStructure = (value: string, result?: ParsedStructure) => {
    setStructure(value);
    if (result) setParsed({ text: value, smiles: result.canonicalSmiles });
  };
  const needsStructure = mode !== 'text';
  const smilesLike = mode === 'text' && looksLikeSmiles(text.trim());
  return (
    <form
      role="search"
      aria-label="Search the group’s records"
      onSubmit={submit}
      className="space-y-3 rounded-plate border border-line bg-surface p-4"
    >
      <ModeSwitch mode={mode} onChange={changeMode} />
      <div className="flex flex-wrap items-end gap-2">
        <TextField
          label={
            needsStructure
              ? 'Words to narrow the structure’s hits (optional)'
              : 'Name, note, notebook reference or class'
          }
          placeholder={needsStructure ? 'e.g. Et3N' : 'e.g. cinnamyl alcohol, KMnO4 streak, AB-02 p. 14, pyridine'}
          className="min-w-64 flex-1"
          value={text}
          onChange={(event) => setText(event.target.value)}
        />
        {mode === 'similar' && (
          <TextField
            label="Least similarity"
            hint="Tanimoto, 0–1"
            type="number"
            min={0}
            max={1}
            step={0.05}
            mono
            className="w-36"
            value={threshold}
            onChange={(event) => setThreshold(event.target.value)}
          />
        )}
        <Button type="submit" variant="primary" disabled={needsStructure && !structureToSend}>
          Search
        </Button>
      </div>
      {smilesLike && (
        <p className="text-sm text-ink-soft">
          That looks like a SMILES.{' '}
          <Button
            size="sm"
            variant="quiet"
            onClick={() => onSearch({ mode: 'similar', q: null, structure: text.trim(), threshold })}
          >
            Search it as a structure (similar)
          </Button>
        </p>
      )}
      {needsStructure && (
        <StructureInput label="Structure to search with" value={structure} onChange={onStructure} defaultMode="paste" />
      )}
    </form>
  );
}
