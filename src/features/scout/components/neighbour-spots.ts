import { solventByKey } from '../../../../shared/catalogue/solvents';
import type { ScoutResult } from '../../../../shared/schemas/scout';

/**
 * The neighbours' recorded Rf values in the suggested pair at a composition near the suggestion (within a third
 * of its % strong solvent, or 3 points), drawn faintly beside the predicted spot.
 */
export function neighbourRfsNear(result: ScoutResult): number[] {
  const suggestion = result.suggestion;
  if (!suggestion) return [];
  const labels = [suggestion.pair.weak, suggestion.pair.strong].map((key) => solventByKey(key)?.label ?? key);
  const tolerance = Math.max(3, suggestion.strongPercent / 3);
  return result.neighbours.flatMap((neighbour) =>
    neighbour.conditions
      .filter(
        (condition) =>
          condition.rf !== null &&
          condition.strongPercent !== null &&
          labels.every((label) => condition.notation.includes(label)),
      )
      .filter((condition) => Math.abs((condition.strongPercent as number) - suggestion.strongPercent) <= tolerance)
      .map((condition) => condition.rf as number),
  );
}

/** Every neighbour plate recorded in the suggested pair, as (% strong solvent, Rf) for the chart. */
export function neighbourPointsInPair(result: ScoutResult) {
  const suggestion = result.suggestion;
  if (!suggestion) return [];
  const labels = [suggestion.pair.weak, suggestion.pair.strong].map((key) => solventByKey(key)?.label ?? key);
  return result.neighbours.flatMap((neighbour) =>
    neighbour.conditions
      .filter(
        (condition) =>
          condition.rf !== null &&
          condition.strongPercent !== null &&
          labels.every((label) => condition.notation.includes(label)),
      )
      .map((condition) => ({
        x: condition.strongPercent as number,
        y: condition.rf as number,
        label: `${neighbour.name ?? neighbour.smiles}: ${condition.notation}`,
      })),
  );
}
