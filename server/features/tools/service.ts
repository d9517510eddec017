import { cautionsFor } from '../../../shared/catalogue/cautions';
import { requireSolvent } from '../../../shared/catalogue/solvents';
import { planColumn, stillSource, stillTable } from '../../../shared/domain/column-plan';
import { translateEluent } from '../../../shared/domain/translate-eluent';
import type { ColumnPlanResult, TranslateEluentResult } from '../../../shared/schemas/tools';
import type { Eluent } from '../../../shared/schemas/eluent';
import { UnprocessableError } from '../../http/errors';

/** The column plan of shared/domain/column-plan.ts (Still, Kahn & Mitra 1978) with its table and the usual cautions. */
export function columnPlanFor(input: {
  sampleMg: number;
  rfTarget: number;
  rfImpurity: number | null;
}): ColumnPlanResult {
  try {
    const plan = planColumn(input);
    return {
      ...plan,
      table: { source: stillSource, rows: [...stillTable] },
      cautions: cautionsFor({ flashColumn: true, handlesSilica: true }),
    };
  } catch (error) {
    if (error instanceof RangeError) throw new UnprocessableError(error.message);
    throw error;
  }
}

/** Equal-strength translation (Snyder's ε°) with hazards of both sides and common greener swaps for the source's solvents. */
export function translateFor(input: {
  from: Eluent;
  to: { weak: { solvent: string; parts: number }[]; strong: { solvent: string; parts: number }[] };
  adsorbent: 'silica' | 'alumina';
}): TranslateEluentResult {
  const result = translateEluent(input.from.components, input.to, input.adsorbent);
  if (!result.ok) throw new UnprocessableError(result.message, { missing: result.missing });
  const greener = input.from.components
    .map(({ solvent }) => requireSolvent(solvent))
    .filter((solvent) => solvent.greenerAlternatives.length > 0)
    .map((solvent) => ({
      solvent: solvent.key,
      name: solvent.name,
      alternatives: solvent.greenerAlternatives.map((item) => ({ solvents: [...item.solvents], note: item.note })),
    }));
  return {
    ...result,
    hazards: {
      source: result.hazards.source.map((item) => ({ ...item, hazards: [...item.hazards] })),
      target: result.hazards.target.map((item) => ({ ...item, hazards: [...item.hazards] })),
    },
    values: result.values.map((item) => ({
      ...item,
      value: { value: item.value.value, provenance: item.value.provenance, source: item.value.source },
    })),
    greener,
    additives: input.from.additives,
  };
}
