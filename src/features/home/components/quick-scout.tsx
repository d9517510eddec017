import { useState, type FormEvent } from 'react';
import { useNavigate } from 'react-router-dom';
import { Button } from '../../../components/ui/button';
import { controlClass } from '../../../components/ui/field';

/** Paste a structure and go to Scout with it, for a first eluent to try. */
export function QuickScout() {
  const [text, setText] = useState('');
  const navigate = useNavigate();
  const submit = (event: FormEvent) => {
    event.preventDefault();
    if (text.trim()) navigate(`/scout?structure=${encodeURIComponent(text.includes('\n') ? text : text.trim())}`);
  };
  return (
    <form onSubmit={submit} className="space-y-2" aria-label="Scout a new compound">
      <label htmlFor="quick-scout" className="block text-sm font-medium">
        New compound? Paste its SMILES or molfile
      </label>
      <div className="flex flex-wrap items-start gap-2">
        <textarea
          id="quick-scout"
          rows={text.includes('\n') ? 6 : 1}
          spellCheck={false}
          autoCapitalize="off"
          placeholder="e.g. O=C(OCC)c1ccc(N)cc1"
          value={text}
          onChange={(event) => setText(event.target.value)}
          className={`${controlClass} figure min-w-64 flex-1 text-sm`}
        />
        <Button type="submit" variant="primary" disabled={!text.trim()}>
          Scout it
        </Button>
      </div>
      <p className="text-xs text-ink-soft">
        Scout suggests a starting eluent from the group’s nearest recorded neighbours, with the evidence.
      </p>
    </form>
  );
}
