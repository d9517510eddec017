import { z } from 'zod';
import { eluentFromInputSchema } from './eluent';
import { solventNameSchema } from './scout';

const rf = z.number().gt(0, 'Rf must be more than 0.').lte(1, 'Rf must be at most 1.');

/** Body of `POST /api/tools/column-plan`: sample mass (mg) and TLC Rf of the target and of the nearest other spot. */
export const columnPlanInputSchema = z.object({
  sampleMg: z.number().positive('Give the sample mass in mg.').max(1_000_000),
  rfTarget: rf,
  rfImpurity: rf.nullish().transform((value) => value ?? null),
});
export type ColumnPlanInput = z.input<typeof columnPlanInputSchema>;

const flagSchema = z.object({ code: z.string(), message: z.string() });
const stillRowSchema = z.object({
  diameterMm: z.number(),
  eluentMl: z.number(),
  loadMgAtDeltaRf02: z.number(),
  loadMgAtDeltaRf01: z.number(),
  fractionMl: z.number(),
});

/** The plan of shared/domain/column-plan.ts with the table it was read from. Units: mm, g, mL, CV. */
export const columnPlanResultSchema = z.object({
  diameterMm: z.number(),
  tableDiameterMm: z.number().nullable(),
  silicaG: z.number(),
  silicaToSample: z.number(),
  eluentMl: z.number(),
  fractionMl: z.number(),
  cvTarget: z.number(),
  deltaCv: z.number().nullable(),
  deltaRf: z.number().nullable(),
  loadColumn: z.enum(['deltaRf02', 'deltaRf01']),
  gradient: z.object({ mode: z.enum(['isocratic', 'step-gradient']), advice: z.string() }),
  load: z.object({ method: z.enum(['dry', 'liquid']), advice: z.string() }),
  flags: z.array(flagSchema),
  sources: z.record(z.string(), z.string()),
  table: z.object({ source: z.string(), rows: z.array(stillRowSchema) }),
  cautions: z.array(z.object({ key: z.string(), title: z.string(), text: z.string() })),
});
export type ColumnPlanResult = z.infer<typeof columnPlanResultSchema>;

/** One side of the target pair: a solvent name, or a fixed blend as parts (a name alone means one part). */
const sideSchema = z.preprocess(
  (value) => (typeof value === 'string' ? [{ solvent: value, parts: 1 }] : value),
  z
    .array(z.object({ solvent: solventNameSchema, parts: z.number().positive() }))
    .min(1)
    .max(3),
);

/**
 * Body of `POST /api/tools/translate-eluent`: the eluent to translate (notation or components) and the pair to
 * translate into, each side one solvent or a fixed blend (e.g. EtOAc/EtOH 3 : 1).
 */
export const translateEluentInputSchema = z.object({
  from: eluentFromInputSchema,
  to: z.object({ weak: sideSchema, strong: sideSchema }),
  adsorbent: z.enum(['silica', 'alumina']).default('silica'),
});
export type TranslateEluentInput = z.input<typeof translateEluentInputSchema>;

const partSchema = z.object({ solvent: z.string(), parts: z.number() });
const hazardSchema = z.object({
  solvent: z.string(),
  name: z.string(),
  hazards: z.array(z.string()),
  hazardNote: z.string(),
});
const sourcedSchema = z.object({ value: z.number(), provenance: z.string(), source: z.string() });

export const translateEluentResultSchema = z.object({
  adsorbent: z.enum(['silica', 'alumina']),
  source: z.object({ components: z.array(partSchema), epsilon: z.number(), description: z.string() }),
  target: z.object({
    components: z.array(partSchema),
    strongVolumeFraction: z.number(),
    epsilon: z.number(),
    description: z.string(),
  }),
  reach: z.enum(['within', 'below-range', 'above-range']),
  targetRange: z.tuple([z.number(), z.number()]),
  warnings: z.array(z.string()),
  hazards: z.object({ source: z.array(hazardSchema), target: z.array(hazardSchema) }),
  values: z.array(z.object({ solvent: z.string(), quantity: z.string(), value: sourcedSchema })),
  equation: z.string(),
  /** Replacements common practice uses for the source's solvents (solvent catalogue). */
  greener: z.array(
    z.object({
      solvent: z.string(),
      name: z.string(),
      alternatives: z.array(z.object({ solvents: z.array(partSchema), note: z.string() })),
    }),
  ),
  /** Additives of the source eluent, carried over unchanged. */
  additives: z.array(z.object({ additive: z.string(), percent: z.number() })),
});
export type TranslateEluentResult = z.infer<typeof translateEluentResultSchema>;
