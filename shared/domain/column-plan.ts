import { columnVolumes, deltaColumnVolumes, rfProblem } from './rf';
import { sizeFromTable, stillSource, type LoadColumn, type TableSize } from './still-table';

export { stillTable, stillSource } from './still-table';

export interface ColumnPlanInput {
  /** Crude sample mass, mg. */
  sampleMg: number;
  /** Target Rf on TLC in the column eluent, (0, 1]. */
  rfTarget: number;
  /** Rf of the nearest other spot, (0, 1]; omitted when unknown. */
  rfImpurity?: number | null;
}

type ColumnPlanFlag =
  'below-table' | 'above-table' | 'delta-rf-below-0.1' | 'no-impurity-rf' | 'rf-target-outside-0.2-0.35';

export interface ColumnPlan {
  diameterMm: number;
  /** The table's column diameter that takes this load (round up to it), null above the table. */
  tableDiameterMm: number | null;
  silicaG: number;
  /** Silica mass per mass of sample (g/g). */
  silicaToSample: number;
  eluentMl: number;
  fractionMl: number;
  cvTarget: number;
  deltaCv: number | null;
  deltaRf: number | null;
  loadColumn: LoadColumn;
  gradient: { mode: 'isocratic' | 'step-gradient'; advice: string };
  load: { method: 'dry' | 'liquid'; advice: string };
  flags: { code: ColumnPlanFlag; message: string }[];
  /** Where each number comes from. */
  sources: Record<
    'diameterMm' | 'eluentMl' | 'fractionMl' | 'silicaG' | 'cvTarget' | 'deltaCv' | 'loadColumn' | 'gradient' | 'load',
    string
  >;
}

/** Bed height 15 cm (Still 1978, from memory) and packed silica about 0.5 g/mL (from memory; typically 0.4–0.6). */
const bedHeightCm = 15;
const packedSilicaGPerMl = 0.5;

const common = 'common practice';

function gradientAdvice(rfTarget: number): ColumnPlan['gradient'] {
  if (rfTarget < 0.2) {
    return {
      mode: 'step-gradient',
      advice:
        `At Rf ${rfTarget} the target needs about ${Math.round(1 / rfTarget)} CV isocratic: run ` +
        `2–3 CV in this eluent to clear faster spots, then step to a stronger one.`,
    };
  }
  if (rfTarget > 0.35)
    return { mode: 'isocratic', advice: 'Weaken the eluent until the target runs at Rf 0.2–0.35, then run isocratic.' };
  return { mode: 'isocratic', advice: `The target should elute after about ${Math.round(10 / rfTarget) / 10} CV.` };
}

function loadAdvice(sampleMg: number, deltaRf: number | null): ColumnPlan['load'] {
  const always = 'Dry load whenever the sample only dissolves in a solvent stronger than the eluent.';
  if (deltaRf !== null && deltaRf < 0.2)
    return {
      method: 'dry',
      advice: `Close spots: a dry load (on silica or Celite) keeps the starting band narrow. ${always}`,
    };
  if (sampleMg > 2000)
    return { method: 'dry', advice: `A large sample would need much loading solvent; dry load it. ${always}` };
  return { method: 'liquid', advice: `Load in the least eluent (or a weaker solvent) that dissolves it. ${always}` };
}

/**
 * Flash-column plan from a TLC result: diameter, eluent volume and fraction size from the table of
 * Still, Kahn & Mitra (J. Org. Chem. 1978, 43, 2923) at the load column for the spots' ΔRf; silica mass from
 * the bed height; column volumes CV = 1/Rf and ΔCV (textbook definitions, common practice; see rf.ts); gradient and
 * loading advice from common practice.
 */
export function planColumn(input: ColumnPlanInput): ColumnPlan {
  const { sampleMg, rfTarget } = input;
  const rfImpurity = input.rfImpurity ?? null;
  if (!(Number.isFinite(sampleMg) && sampleMg > 0)) throw new RangeError('Sample mass must be more than 0 mg.');
  for (const rf of [rfTarget, ...(rfImpurity === null ? [] : [rfImpurity])]) {
    const problem = rfProblem(rf);
    if (problem) throw new RangeError(problem);
  }
  const deltaRf = rfImpurity === null ? null : Math.abs(rfTarget - rfImpurity);
  const loadColumn: LoadColumn = deltaRf !== null && deltaRf >= 0.2 - 1e-9 ? 'deltaRf02' : 'deltaRf01';
  const size: TableSize = sizeFromTable(sampleMg, loadColumn);
  const flags: ColumnPlan['flags'] = [];
  if (size.position === 'below-table')
    flags.push({
      code: 'below-table',
      message: 'Less sample than the smallest row of the table: its 10 mm column is used.',
    });
  if (size.position === 'above-table')
    flags.push({
      code: 'above-table',
      message:
        'More sample than the largest row of the table: the size is extrapolated; consider splitting the sample.',
    });
  if (deltaRf === null)
    flags.push({ code: 'no-impurity-rf', message: 'No neighbouring spot given: sized for ΔRf ≥ 0.1 to be safe.' });
  else if (deltaRf < 0.1)
    flags.push({
      code: 'delta-rf-below-0.1',
      message:
        `ΔRf ${Math.round(deltaRf * 100) / 100} is below the table’s 0.1: find an eluent that ` +
        `separates the spots better, or load much less.`,
    });
  if (rfTarget < 0.2 || rfTarget > 0.35)
    flags.push({
      code: 'rf-target-outside-0.2-0.35',
      message: `Target Rf ${rfTarget} is outside 0.2–0.35, where flash columns work best.`,
    });
  const bedVolumeMl = Math.PI * (size.diameterMm / 20) ** 2 * bedHeightCm;
  const silicaG = bedVolumeMl * packedSilicaGPerMl;
  return {
    diameterMm: size.diameterMm,
    tableDiameterMm: size.tableDiameterMm,
    silicaG,
    silicaToSample: silicaG / (sampleMg / 1000),
    eluentMl: size.eluentMl,
    fractionMl: size.fractionMl,
    cvTarget: columnVolumes(rfTarget),
    deltaCv: rfImpurity === null ? null : deltaColumnVolumes(rfTarget, rfImpurity),
    deltaRf,
    loadColumn,
    gradient: gradientAdvice(rfTarget),
    load: loadAdvice(sampleMg, deltaRf),
    flags,
    sources: {
      diameterMm: size.source,
      eluentMl: size.source,
      fractionMl: size.source,
      silicaG: `bed of ${bedHeightCm} cm (${stillSource}; from memory) × packed silica ${packedSilicaGPerMl} g/mL (from memory)`,
      cvTarget: 'CV = 1/Rf (common practice)',
      deltaCv: 'ΔCV = |1/Rf₁ − 1/Rf₂| (common practice)',
      loadColumn: `${stillSource}: load column ΔRf ≥ ${loadColumn === 'deltaRf02' ? '0.2' : '0.1'}`,
      gradient: common,
      load: common,
    },
  };
}
