import { useEffect } from 'react';
import { useSearchParams } from 'react-router-dom';
import { Card } from '../components/ui/card';
import { HazardLine } from '../components/ui/hazard-line';
import { EmptyState } from '../components/ui/empty-state';
import { useScout } from '../features/scout/api/scout';
import { ScoutForm } from '../features/scout/components/scout-form';
import { SuggestionHero } from '../features/scout/components/suggestion-hero';
import { NeighboursTable } from '../features/scout/components/neighbours-table';
import { AdditiveList, EvidenceList, StainList, WarningList } from '../features/scout/components/advice-lists';
import { ResponseCurve } from '../features/scout/components/response-curve';
import { ColumnPlanPanel } from '../features/tools/components/column-plan-panel';

/** Scout: draw a molecule, get a first plate to run with the evidence behind every number. */
export default function ScoutPage() {
  const scout = useScout();
  const result = scout.data;
  // A structure handed over in the address (e.g. from the home page's quick box) is scouted straight away.
  const [params] = useSearchParams();
  const handedOver = params.get('structure') ?? '';
  const { mutate } = scout;
  useEffect(() => {
    if (handedOver.trim()) mutate({ structure: handedOver, targetRf: 0.3 });
  }, [handedOver, mutate]);
  return (
    <section className="space-y-4">
      <header className="space-y-1">
        <h1 className="text-2xl font-semibold">Scout</h1>
        <p className="max-w-3xl text-sm text-ink-soft">
          Starting conditions for a new molecule from the group’s recorded purifications: the nearest neighbours, a
          ratio for your target Rf, additives, stains and how sure the estimate is. Scout estimates; run a TLC plate
          before the column.
        </p>
      </header>
      <Card>
        <ScoutForm
          key={handedOver}
          initialStructure={handedOver}
          onSubmit={(input) => scout.mutate(input)}
          busy={scout.isPending}
        />
      </Card>
      {scout.error && (
        <p role="alert" className="rounded-plate border border-failed/40 bg-surface p-3 text-sm text-failed">
          {scout.error.message}
        </p>
      )}
      {!result && !scout.error && (
        <EmptyState title="Nothing scouted yet">
          Draw or paste a structure (SMILES or molfile), pick the Rf you want and press “Scout conditions”.
        </EmptyState>
      )}
      {result && (
        <div className="space-y-4" data-testid="scout-result">
          <SuggestionHero result={result} />
          {result.cautions.length > 0 && (
            <HazardLine>{result.cautions.map((caution) => caution.title).join(' · ')}.</HazardLine>
          )}
          <div className="grid gap-4 lg:grid-cols-3">
            <Card title="Additives the neighbours needed">
              <AdditiveList additives={result.additives} />
            </Card>
            <Card title="Stains likely to show it">
              <StainList stains={result.stains} />
            </Card>
            <Card title="Warnings from failed attempts">
              <WarningList warnings={result.warnings} />
            </Card>
          </div>
          <div className="grid gap-4 lg:grid-cols-2">
            <Card title="Why these numbers">
              <EvidenceList evidence={result.evidence} />
            </Card>
            {result.suggestion && (
              <Card title="Predicted Rf across the pair">
                <ResponseCurve result={result} />
              </Card>
            )}
          </div>
          <Card title={`Nearest recorded neighbours (${result.neighbours.length})`}>
            <NeighboursTable neighbours={result.neighbours} />
          </Card>
          <ColumnPlanPanel
            key={`${result.query.canonicalSmiles}-${result.suggestion?.label}`}
            title="Column plan for this suggestion"
            rfTarget={
              result.suggestion ? Math.min(0.99, Math.max(0.05, result.suggestion.predictedRf)) : result.targetRf
            }
          />
        </div>
      )}
    </section>
  );
}
