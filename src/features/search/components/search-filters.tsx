import { compoundClasses } from '../../../../shared/catalogue/compound-classes';
import { solvents } from '../../../../shared/catalogue/solvents';
import { stains } from '../../../../shared/catalogue/stains';
import { stationaryPhases } from '../../../../shared/catalogue/stationary-phases';
import { outcomes, techniqueLabels, techniques } from '../../../../shared/schemas/record-parts';
import { Button } from '../../../components/ui/button';
import { TextField } from '../../../components/ui/field';
import { SelectField } from '../../../components/ui/select';
import { useContributors } from '../api/contributors';
import { searchFilterKeys, type SearchFilterKey, type SearchState } from '../hooks/use-search-url';

interface SearchFiltersProps {
  filters: SearchState['filters'];
  onChange: (changes: Partial<Record<SearchFilterKey, string | null>>) => void;
}

/** Filters that narrow any search (words, similar or substructure); each applies at once and lives in the URL. */
export function SearchFilters({ filters, onChange }: SearchFiltersProps) {
  const contributors = useContributors();
  const field = (key: SearchFilterKey) => ({
    value: filters[key] ?? '',
    onChange: (event: { target: { value: string } }) => onChange({ [key]: event.target.value || null }),
  });
  const active = searchFilterKeys.filter((key) => filters[key]).length;
  return (
    <section aria-label="Filters" className="rounded-plate border border-line bg-surface p-3">
      <div className="grid grid-cols-1 gap-3 sm:grid-cols-2 lg:grid-cols-5">
        <SelectField
          label="Compound class"
          placeholder="Any class"
          options={compoundClasses.map((entry) => ({ value: entry.key, label: entry.name }))}
          {...field('class')}
        />
        <SelectField
          label="Stationary phase"
          placeholder="Any phase"
          options={stationaryPhases.map((phase) => ({ value: phase.key, label: phase.name }))}
          {...field('phase')}
        />
        <SelectField
          label="Solvent in the eluent"
          placeholder="Any solvent"
          options={solvents.map((solvent) => ({ value: solvent.key, label: `${solvent.label} — ${solvent.name}` }))}
          {...field('solvent')}
        />
        <SelectField
          label="Visualisation"
          placeholder="Any"
          options={stains.map((stain) => ({ value: stain.key, label: stain.label }))}
          {...field('stain')}
        />
        <SelectField
          label="Outcome"
          placeholder="Any outcome"
          options={outcomes.map((outcome) => ({ value: outcome, label: outcome }))}
          {...field('outcome')}
        />
        <SelectField
          label="Technique"
          placeholder="Any technique"
          options={techniques.map((technique) => ({ value: technique, label: techniqueLabels[technique] }))}
          {...field('technique')}
        />
        <SelectField
          label="Contributor"
          placeholder="Anyone"
          options={(contributors.data?.items ?? []).map((person) => ({
            value: String(person.id),
            label: `${person.name} (${person.records})`,
          }))}
          {...field('contributor')}
        />
        <TextField label="Added from" type="date" {...field('from')} />
        <TextField label="Added to" type="date" {...field('to')} />
        <div className="flex items-end">
          <Button
            size="md"
            disabled={active === 0}
            onClick={() => onChange(Object.fromEntries(searchFilterKeys.map((key) => [key, null])))}
          >
            Clear {active > 0 ? `${active} filter${active === 1 ? '' : 's'}` : 'filters'}
          </Button>
        </div>
      </div>
    </section>
  );
}
