import { useSearchParams } from 'react-router-dom';
import { ColumnPlanPanel } from '../features/tools/components/column-plan-panel';
import { EluentTranslator } from '../features/tools/components/eluent-translator';

/** An Rf handed over in the address (`?rfTarget=0.3&rfImpurity=0.45`, e.g. from a plate read), or undefined. */
function rfParam(params: URLSearchParams, name: string): number | undefined {
  const value = Number(params.get(name));
  return params.has(name) && value > 0 && value <= 1 ? value : undefined;
}

/** The calculators: column planner (Still, Kahn & Mitra 1978) and eluent translator (Snyder's ε°). */
export default function ToolsPage() {
  const [params] = useSearchParams();
  const rfTarget = rfParam(params, 'rfTarget');
  const rfImpurity = rfParam(params, 'rfImpurity') ?? null;
  return (
    <section className="space-y-4">
      <header className="space-y-1">
        <h1 className="text-2xl font-semibold">Column planner and eluent translator</h1>
        <p className="max-w-3xl text-sm text-ink-soft">
          Every number says where it came from: the 1978 sizing table, CV = 1/Rf, Snyder’s mixed-solvent strength.
          Confirm on a TLC plate before the column.
        </p>
      </header>
      <ColumnPlanPanel title="Column planner" showTable rfTarget={rfTarget} rfImpurity={rfImpurity} />
      <EluentTranslator />
    </section>
  );
}
