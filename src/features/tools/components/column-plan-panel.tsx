import { useId, useState } from 'react';
import { Card } from '../../../components/ui/card';
import { TextField } from '../../../components/ui/field';
import { HazardLine } from '../../../components/ui/hazard-line';
import { useColumnPlan } from '../api/column-plan';
import { PlanFigures } from './plan-figures';
import { StillTableView } from './still-table-view';

export interface ColumnPlanPanelProps {
  /** Prefill: the target's Rf in the column eluent (e.g. Scout's predicted Rf or a record's target spot). */
  rfTarget?: number;
  /** Prefill: the Rf of the nearest other spot. */
  rfImpurity?: number | null;
  sampleMg?: number;
  title?: string;
  /** Show the 1978 table under the plan (the tools page does; panels on other pages keep it folded). */
  showTable?: boolean;
}

const asNumber = (text: string) => (text.trim() === '' ? null : Number(text));
const rfError = (value: number | null) =>
  value === null || Number.isNaN(value) || value <= 0 || value > 1 ? 'An Rf between 0 and 1.' : undefined;

/**
 * The column planner as a panel: sample mass and TLC Rf values in; diameter, silica, eluent, fractions, column
 * volumes and advice out, each with its source (Still, Kahn & Mitra 1978; CV = 1/Rf). Drop it on any page.
 */
export function ColumnPlanPanel({
  rfTarget = 0.3,
  rfImpurity = null,
  sampleMg = 500,
  title = 'Column plan',
  showTable = false,
}: ColumnPlanPanelProps) {
  const id = useId();
  const [mass, setMass] = useState(String(sampleMg));
  const [target, setTarget] = useState(rfTarget.toFixed(2));
  const [impurity, setImpurity] = useState(rfImpurity === null ? '' : rfImpurity.toFixed(2));
  const massValue = asNumber(mass);
  const targetValue = asNumber(target);
  const impurityValue = asNumber(impurity);
  const errors = {
    mass: massValue === null || Number.isNaN(massValue) || massValue <= 0 ? 'A mass above 0 mg.' : undefined,
    target: rfError(targetValue),
    impurity: impurityValue === null ? undefined : rfError(impurityValue),
  };
  const valid = !errors.mass && !errors.target && !errors.impurity;
  const plan = useColumnPlan(
    valid ? { sampleMg: massValue as number, rfTarget: targetValue as number, rfImpurity: impurityValue } : null,
  );
  return (
    <Card title={title} level={2}>
      <form
        aria-labelledby={`${id}-inputs`}
        className="grid grid-cols-1 gap-3 sm:grid-cols-3"
        onSubmit={(event) => event.preventDefault()}
      >
        <span id={`${id}-inputs`} className="sr-only">
          Column plan inputs
        </span>
        <TextField
          label="Sample (mg)"
          inputMode="decimal"
          mono
          value={mass}
          onChange={(event) => setMass(event.target.value)}
          error={errors.mass}
        />
        <TextField
          label="Target Rf"
          inputMode="decimal"
          mono
          value={target}
          onChange={(event) => setTarget(event.target.value)}
          error={errors.target}
          hint="In the column eluent."
        />
        <TextField
          label="Nearest other spot Rf"
          inputMode="decimal"
          mono
          value={impurity}
          onChange={(event) => setImpurity(event.target.value)}
          error={errors.impurity}
          hint="Leave empty if unknown."
        />
      </form>
      <div className="mt-4" aria-live="polite">
        {plan.error && (
          <p role="alert" className="text-sm text-failed">
            {plan.error.message}
          </p>
        )}
        {plan.data && valid && <PlanFigures plan={plan.data} />}
      </div>
      {plan.data &&
        (showTable ? (
          <StillTableView table={plan.data.table} highlight={plan.data.tableDiameterMm} />
        ) : (
          <details className="mt-3 text-sm">
            <summary className="cursor-pointer text-front">The 1978 table</summary>
            <StillTableView table={plan.data.table} highlight={plan.data.tableDiameterMm} />
          </details>
        ))}
      <div className="mt-3">
        <HazardLine>Pressurised glass columns, silica dust, flammable eluents.</HazardLine>
      </div>
    </Card>
  );
}
