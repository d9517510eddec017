import { z } from 'zod';
import { resolvePhase, resolveStain } from '../catalogue/lookup';
import { rfFromDistances, rfProblem } from '../domain/rf';

export const techniques = ['tlc', 'flash', 'prep_tlc'] as const;
export const techniqueLabels: Record<(typeof techniques)[number], string> = {
  tlc: 'TLC',
  flash: 'flash column',
  prep_tlc: 'preparative TLC',
};
export const outcomes = ['clean', 'partial', 'failed'] as const;
export const recordStatuses = ['active', 'merged', 'retired'] as const;
export const spotRoles = ['target', 'starting_material', 'by_product', 'unknown'] as const;
export const spotRoleLabels: Record<(typeof spotRoles)[number], string> = {
  target: 'target',
  starting_material: 'starting material',
  by_product: 'by-product',
  unknown: 'unknown',
};
export const spotLanes = ['starting_material', 'co_spot', 'mixture'] as const;
export const spotLaneLabels: Record<(typeof spotLanes)[number], string> = {
  starting_material: 'SM lane',
  co_spot: 'co-spot',
  mixture: 'mixture',
};
export const loadMethods = ['dry', 'liquid'] as const;

/** Rf tolerance when both an Rf and the distances are given: half a millimetre on a 50 mm run (common practice). */
const rfAgreement = 0.01;

const optionalText = (max: number) =>
  z
    .string()
    .trim()
    .max(max)
    .nullish()
    .transform((value) => (value ? value : null));
const optionalPositive = z
  .number()
  .positive()
  .finite()
  .nullish()
  .transform((value) => value ?? null);

/**
 * A spot on the plate. Give `rf`, or `spotDistanceMm` and `frontDistanceMm` (mm from the origin) and the Rf
 * is computed as spot / front; a spot beyond the front or an Rf outside (0, 1] is refused.
 */
export const spotInputSchema = z
  .object({
    role: z.enum(spotRoles),
    rf: z.number().nullish(),
    spotDistanceMm: z.number().nullish(),
    frontDistanceMm: z.number().nullish(),
    lane: z.enum(spotLanes).nullish(),
    label: optionalText(100),
  })
  .transform((spot, context) => {
    const hasSpot = spot.spotDistanceMm != null;
    const hasFront = spot.frontDistanceMm != null;
    let rf = spot.rf ?? null;
    if (hasSpot !== hasFront) {
      context.addIssue({
        code: 'custom',
        path: [hasSpot ? 'frontDistanceMm' : 'spotDistanceMm'],
        message: 'Give both the spot and the solvent-front distance (mm), or neither.',
      });
      return z.NEVER;
    }
    if (hasSpot && hasFront) {
      const measured = rfFromDistances(spot.spotDistanceMm as number, spot.frontDistanceMm as number);
      if (!measured.ok) {
        context.addIssue({
          code: 'custom',
          path: [measured.code === 'front-not-positive' ? 'frontDistanceMm' : 'spotDistanceMm'],
          message: measured.message,
        });
        return z.NEVER;
      }
      if (rf != null && Math.abs(rf - measured.rf) > rfAgreement) {
        context.addIssue({
          code: 'custom',
          path: ['rf'],
          message: `Rf ${rf} disagrees with the distances, which give ${measured.rf.toFixed(2)}.`,
        });
        return z.NEVER;
      }
      rf = measured.rf;
    }
    if (rf == null) {
      context.addIssue({
        code: 'custom',
        path: ['rf'],
        message: 'Give the Rf, or the spot and solvent-front distances (mm).',
      });
      return z.NEVER;
    }
    const problem = rfProblem(rf);
    if (problem) {
      context.addIssue({ code: 'custom', path: ['rf'], message: problem });
      return z.NEVER;
    }
    return {
      role: spot.role,
      rf,
      lane: spot.lane ?? null,
      spotDistanceMm: spot.spotDistanceMm ?? null,
      frontDistanceMm: spot.frontDistanceMm ?? null,
      label: spot.label,
    };
  });
export type SpotInput = z.input<typeof spotInputSchema>;
export type Spot = z.output<typeof spotInputSchema>;

function unknownName(kind: string, input: string, suggestion: string | null) {
  return {
    code: 'custom' as const,
    message: `Unknown ${kind} "${input}".${suggestion ? ` Did you mean "${suggestion}"?` : ''}`,
    params: { unknownWord: input, suggestion },
  };
}

/**
 * A visualisation: a name or abbreviation from the stain catalogue ("UV 254", "KMnO4", "CAM"), or
 * `{ method: 'other', note }` for anything else. Resolves to `{ method: key | 'other', note }`.
 */
export const visualisationInputSchema = z
  .union([
    z.string().trim().min(1).max(80),
    z.object({ method: z.string().trim().min(1).max(80), note: optionalText(200) }),
  ])
  .transform((entry, context) => {
    const method = typeof entry === 'string' ? entry : entry.method;
    const note = typeof entry === 'string' ? null : entry.note;
    if (method.toLowerCase() === 'other') {
      if (!note)
        context.addIssue({ code: 'custom', path: ['note'], message: 'Name the method when choosing "other".' });
      return { method: 'other', note };
    }
    const found = resolveStain(method);
    if (!found.ok) {
      context.addIssue(unknownName('visualisation', method, found.suggestion));
      return z.NEVER;
    }
    return { method: found.value.key, note };
  });
export type Visualisation = z.output<typeof visualisationInputSchema>;

/** A stationary phase by catalogue key, name or abbreviation ("silica", "SiO2", "C18"); resolves to the key. */
export const phaseNameSchema = z
  .string()
  .trim()
  .min(1)
  .max(80)
  .transform((input, context) => {
    const found = resolvePhase(input);
    if (found.ok) return found.value.key;
    context.addIssue(unknownName('stationary phase', input, found.suggestion));
    return z.NEVER;
  });

/** Flash-column details; every field optional. Units: mm, g, mg, mL, %. */
export const columnDetailsSchema = z.object({
  diameterMm: optionalPositive,
  cartridgeSize: optionalText(40),
  silicaG: optionalPositive,
  sampleMg: optionalPositive,
  loadMethod: z
    .enum(loadMethods)
    .nullish()
    .transform((value) => value ?? null),
  fractionMl: optionalPositive,
  fractionsPooled: optionalText(60),
  yieldPercent: z
    .number()
    .min(0)
    .max(100)
    .nullish()
    .transform((value) => value ?? null),
  purityNote: optionalText(300),
});
export type ColumnDetails = z.output<typeof columnDetailsSchema>;
