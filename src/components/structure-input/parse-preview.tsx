import type { ReactNode } from 'react';
import { compoundClassByKey } from '../../../shared/catalogue/compound-classes';
import { Chip } from '../ui/chip';
import { Formula } from './formula';
import type { ParsedStructure } from './types';

const classLabel = (key: string) => compoundClassByKey(key)?.name ?? key.replace(/[-_]+/g, ' ');

function Figure({ term, children, unit }: { term: string; children: ReactNode; unit?: string }) {
  return (
    <div className="flex items-baseline justify-between gap-2 border-b border-line/70 py-0.5 last:border-0">
      <dt className="text-ink-soft">{term}</dt>
      <dd className="figure text-ink">
        {children}
        {unit && <span className="ml-1 text-ink-soft">{unit}</span>}
      </dd>
    </div>
  );
}

/** Salt, mixture and "already known" notes: what the identity rests on (issue 4: identity from the parent). */
function IdentityNotes({ parsed }: { parsed: ParsedStructure }) {
  return (
    <>
      {(parsed.isSalt || parsed.isMixture) && (
        <p className="mt-1 text-xs text-ink-soft">
          {parsed.isSalt ? 'Salt' : 'Mixture'}: the compound is identified by its largest organic part; descriptors are
          of that parent. Your full input is kept.
        </p>
      )}
      {parsed.existingCompoundId !== null && (
        <p className="mt-1 text-xs text-ink">
          Already in the group's base:{' '}
          <a
            href={`/compounds/${parsed.existingCompoundId}`}
            target="_blank"
            rel="noopener"
            className="text-front underline underline-offset-2"
          >
            open its compound page
          </a>{' '}
          (new tab, your input stays here).
        </p>
      )}
    </>
  );
}

/** The server's depiction, key descriptors and compound classes of the parsed structure. */
export function ParsePreview({ parsed, stale }: { parsed: ParsedStructure; stale: boolean }) {
  const src = `data:image/svg+xml;charset=utf-8,${encodeURIComponent(parsed.svg)}`;
  return (
    <div className={`transition-opacity ${stale ? 'opacity-50' : ''}`} aria-busy={stale}>
      <div className="grid aspect-[4/3] place-items-center rounded-plate border border-line bg-surface">
        <img src={src} alt={`Depiction of ${parsed.canonicalSmiles}`} className="h-full w-full object-contain" />
      </div>
      {parsed.name && <p className="mt-2 text-sm font-medium text-ink">{parsed.name}</p>}
      <IdentityNotes parsed={parsed} />
      <dl className="mt-2 text-sm">
        <Figure term="Formula">
          <Formula formula={parsed.formula} />
        </Figure>
        <Figure term="MW" unit="g/mol">
          {parsed.mw.toFixed(2)}
        </Figure>
        <Figure term="cLogP">{parsed.clogp.toFixed(2)}</Figure>
        <Figure term="TPSA" unit="Å²">
          {parsed.tpsa.toFixed(1)}
        </Figure>
        <Figure term="HBD / HBA">
          {parsed.hbd} / {parsed.hba}
        </Figure>
        {parsed.charge !== 0 && (
          <Figure term="Net charge">{parsed.charge > 0 ? `+${parsed.charge}` : parsed.charge}</Figure>
        )}
      </dl>
      {parsed.classes.length > 0 && (
        <ul className="mt-2 flex flex-wrap gap-1" aria-label="Compound classes">
          {parsed.classes.map((c) => (
            <li key={c}>
              <Chip tone="front" title={compoundClassByKey(c)?.description}>
                {classLabel(c)}
              </Chip>
            </li>
          ))}
        </ul>
      )}
      <p className="mt-2 text-2xs text-ink-soft">
        Computed on the server with OpenChemLib; cLogP and TPSA are its estimates. Classes come from the group's
        substructure catalogue.
      </p>
      <p className="figure mt-1 break-all text-2xs text-ink-soft" title="Canonical SMILES">
        {parsed.canonicalSmiles}
      </p>
    </div>
  );
}
