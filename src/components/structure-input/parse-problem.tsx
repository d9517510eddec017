import { ApiRequestError } from '../../lib/api-client';
import { looksLikeMolfile } from './structure-text';
import type { StructureProblemPlace } from './types';

/** The SMILES with the character at `position` (1-based) marked, and a caret under it. */
function SmilesAt({ smiles, position }: { smiles: string; position: number }) {
  const i = Math.min(Math.max(position - 1, 0), Math.max(smiles.length - 1, 0));
  return (
    <pre className="figure mt-1 overflow-x-auto text-sm text-ink" aria-hidden="true">
      {smiles.slice(0, i)}
      <mark className="rounded-sm bg-failed/15 text-failed underline decoration-2">{smiles[i] ?? ' '}</mark>
      {smiles.slice(i + 1)}
      {'\n'}
      {' '.repeat(i)}^
    </pre>
  );
}

function placeWords(place: StructureProblemPlace): string {
  const bits = [
    place.record !== undefined && `record ${place.record}`,
    place.line !== undefined && `line ${place.line}`,
    place.position !== undefined && `character ${place.position}`,
    place.atom !== undefined && `atom ${place.atom}${place.token ? ` (${place.token})` : ''}`,
    place.atom === undefined && place.token && `at “${place.token}”`,
  ].filter(Boolean);
  return bits.length ? `Where: ${bits.join(', ')}.` : '';
}

/** What the server refused and where in the text: the message, a place line, and the spot marked. */
export function ParseProblem({ error, text }: { error: unknown; text: string }) {
  if (!(error instanceof ApiRequestError)) {
    return (
      <div role="alert" className="rounded-plate border border-failed/40 bg-surface p-3 text-sm text-failed">
        Could not reach the server to check this structure. Your text is kept; it will be checked again when you edit
        it.
      </div>
    );
  }
  const place = (error.details[0] ?? {}) as StructureProblemPlace;
  const molfile = looksLikeMolfile(text);
  const line = molfile && place.line ? text.split(/\r?\n/)[place.line - 1] : undefined;
  return (
    <div role="alert" className="rounded-plate border border-failed/40 bg-surface p-3 text-sm">
      <p className="font-medium text-failed">
        {error.status === 413 && 'Too large to check: '}
        {error.message}
      </p>
      {placeWords(place) && <p className="mt-1 text-ink-soft">{placeWords(place)}</p>}
      {!molfile && place.position !== undefined && <SmilesAt smiles={text.trim()} position={place.position} />}
      {line !== undefined && <pre className="figure mt-1 overflow-x-auto bg-failed/5 text-xs text-ink">{line}</pre>}
    </div>
  );
}
