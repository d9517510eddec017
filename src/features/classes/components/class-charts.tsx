import type { ClassDetail } from '../../../../shared/schemas/classes';
import { binValues, Histogram, Scatter } from '../../../components/ui/chart';
import { DemoMark } from '../../../components/ui/demo-mark';

/** "12 of 40 records here are invented demo data", with the demo mark, when any are. */
function DemoShare({ points }: { points: { demo: boolean }[] }) {
  const demo = points.filter((point) => point.demo).length;
  if (demo === 0) return null;
  return (
    <p className="text-xs text-ink-soft" data-testid="class-demo-share">
      <DemoMark /> {demo} of the {points.length} records charted are invented demo data.
    </p>
  );
}

const STEP = 0.05;

/** The distribution of Snyder's ε° (silica) over the class's records, with where the numbers come from. */
export function StrengthHistogram({ strength, className }: { strength: ClassDetail['strength']; className: string }) {
  const values = strength.points.map((point) => point.epsilon);
  if (values.length === 0)
    return <p className="text-sm text-ink-soft">No record of this class on silica with a solvent of known ε°.</p>;
  const from = Math.floor(Math.min(...values) / STEP) * STEP;
  const to = Math.max(from + STEP, Math.ceil(Math.max(...values) / STEP) * STEP);
  return (
    <figure className="space-y-2">
      <Histogram
        title={`Eluent strength used for ${className}`}
        x={{ label: 'ε° on silica (Snyder)', domain: [from, to] }}
        countLabel="records"
        bins={binValues(values, from, to, STEP)}
      />
      <figcaption className="text-xs text-ink-soft">
        Computed from each record’s eluent (a gradient by its final mixture). {strength.source}.
        {strength.skipped > 0 &&
          ` ${strength.skipped} record${strength.skipped === 1 ? '' : 's'} not on silica or with a solvent of unknown ε° left out.`}
      </figcaption>
      <DemoShare points={strength.points} />
    </figure>
  );
}

/** Target Rf against % strong solvent in the class's most used pair: how far a ratio moves the spot. */
export function RfScatter({ rf }: { rf: NonNullable<ClassDetail['rf']> }) {
  const strong = rf.pair.join(' / ');
  return (
    <div className="space-y-2">
      <Scatter
        title={`Target Rf against eluent composition (${strong})`}
        x={{ label: '% stronger solvent', unit: '% v/v' }}
        y={{ label: 'target Rf', domain: [0, 1] }}
        points={rf.points.map((point) => ({
          x: point.strongPercent,
          y: point.rf,
          label: `record ${point.recordId} (${point.outcome}${point.demo ? ', demo data' : ''})`,
          highlight: point.outcome === 'failed',
        }))}
      />
      <DemoShare points={rf.points} />
    </div>
  );
}
