import { ParsePreview } from './parse-preview';
import { ParseProblem } from './parse-problem';
import type { useStructureParse } from './use-structure-parse';

/** The live check beside the input: nothing yet, checking, accepted (with preview) or refused (with reason). */
export function ParseStatus({ value, check }: { value: string; check: ReturnType<typeof useStructureParse> }) {
  let line: { text: string; tone: string };
  if (!value.trim()) line = { text: 'Nothing to check yet', tone: 'text-ink-soft' };
  else if (check.isChecking) line = { text: 'Checking with the server…', tone: 'text-ink-soft' };
  else if (check.error) line = { text: '✕ Not accepted', tone: 'text-failed' };
  else if (check.isCurrent) line = { text: '✓ Accepted', tone: 'text-clean' };
  else line = { text: '', tone: '' };
  return (
    <aside aria-label="Structure check" className="flex min-w-0 flex-col gap-2">
      <p role="status" className={`text-xs font-medium ${line.tone}`}>
        {line.text}
      </p>
      {!value.trim() && (
        <p className="text-sm text-ink-soft">
          Draw the structure or paste a SMILES or molfile; its formula, weight and classes appear here.
        </p>
      )}
      {check.error && !check.isChecking ? <ParseProblem error={check.error} text={value} /> : null}
      {check.parsed && !check.error && <ParsePreview parsed={check.parsed} stale={!check.isCurrent} />}
    </aside>
  );
}
