import { useEffect, useState, type FormEvent } from 'react';
import { stationaryPhases } from '../../../../shared/catalogue/stationary-phases';
import { solvents } from '../../../../shared/catalogue/solvents';
import { stains } from '../../../../shared/catalogue/stains';
import { compoundClasses } from '../../../../shared/catalogue/compound-classes';
import { outcomes, techniqueLabels, techniques } from '../../../../shared/schemas/record-parts';
import { SelectField } from '../../../components/ui/select';
import { TextField } from '../../../components/ui/field';
import { Button } from '../../../components/ui/button';
import type { RecordListQuery } from '../../../../shared/schemas/record';

interface RecordFiltersProps {
  query: RecordListQuery;
  onChange: (changes: Record<string, string | null>) => void;
}

const value = (input: unknown) => (input === undefined || input === null ? '' : String(input));

/** The filters of the records table. Text is applied on submit; every other filter at once. */
export function RecordFilters({ query, onChange }: RecordFiltersProps) {
  const [text, setText] = useState(value(query.q));
  useEffect(() => setText(value(query.q)), [query.q]);
  const submit = (event: FormEvent) => {
    event.preventDefault();
    onChange({ q: text.trim() || null });
  };
  const select = (key: string) => ({
    value: value(query[key as keyof RecordListQuery]),
    onChange: (event: { target: { value: string } }) => onChange({ [key]: event.target.value || null }),
  });
  return (
    <form
      onSubmit={submit}
      role="search"
      aria-label="Filter records"
      className="grid grid-cols-1 gap-3 rounded-plate border border-line bg-surface p-3 sm:grid-cols-2 lg:grid-cols-4"
    >
      <div className="flex items-end gap-2 sm:col-span-2">
        <TextField
          label="Text"
          placeholder="name, synonym, notebook, note, reason…"
          className="flex-1"
          value={text}
          onChange={(event) => setText(event.target.value)}
        />
        <Button type="submit" variant="primary">
          Filter
        </Button>
      </div>
      <SelectField
        label="Stationary phase"
        placeholder="Any phase"
        options={stationaryPhases.map((phase) => ({ value: phase.key, label: phase.name }))}
        {...select('phase')}
      />
      <SelectField
        label="Solvent"
        placeholder="Any solvent"
        options={solvents.map((solvent) => ({ value: solvent.key, label: `${solvent.label} — ${solvent.name}` }))}
        {...select('solvent')}
      />
      <SelectField
        label="Visualisation"
        placeholder="Any"
        options={stains.map((stain) => ({ value: stain.key, label: stain.label }))}
        {...select('stain')}
      />
      <SelectField
        label="Outcome"
        placeholder="Any outcome"
        options={outcomes.map((outcome) => ({ value: outcome, label: outcome }))}
        {...select('outcome')}
      />
      <SelectField
        label="Technique"
        placeholder="Any technique"
        options={techniques.map((technique) => ({ value: technique, label: techniqueLabels[technique] }))}
        {...select('technique')}
      />
      <SelectField
        label="Compound class"
        placeholder="Any class"
        options={compoundClasses.map((entry) => ({ value: entry.key, label: entry.name }))}
        {...select('class')}
      />
      <SelectField
        label="Status"
        options={[
          { value: 'active', label: 'active' },
          { value: 'retired', label: 'retired' },
          { value: 'merged', label: 'merged' },
          { value: 'all', label: 'all' },
        ]}
        {...select('status')}
      />
      <TextField label="Added from" type="date" {...select('from')} />
      <TextField label="Added to" type="date" {...select('to')} />
    </form>
  );
}
