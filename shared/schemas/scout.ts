import { z } from 'zod';
import { resolveSolvent } from '../catalogue/lookup';
import { phaseNameSchema } from './record-parts';

/** A solvent by catalogue key, name or abbreviation ("EtOAc", "hexane"); resolves to the key. */
export const solventNameSchema = z
  .string()
  .trim()
  .min(1)
  .max(60)
  .transform((input, context) => {
    const found = resolveSolvent(input);
    if (found.ok) return found.value.key;
    context.addIssue({
      code: 'custom',
      message: `Unknown solvent "${input}".${found.suggestion ? ` Did you mean "${found.suggestion}"?` : ''}`,
    });
    return z.NEVER;
  });

/** Target Rf bounds for Scout: flash columns work best with the target near Rf 0.2–0.35 (Still 1978; common practice). */
export const scoutTargetRange = [0.15, 0.45] as const;

/** Body of `POST /api/scout`: a structure (SMILES or molfile), the Rf to aim at, and optionally a pair and a phase. */
export const scoutInputSchema = z.object({
  structure: z.string().trim().min(1, 'Give a structure (SMILES or molfile).').max(200_000),
  targetRf: z.number().min(scoutTargetRange[0]).max(scoutTargetRange[1]).default(0.3),
  solventPair: z
    .object({ weak: solventNameSchema, strong: solventNameSchema })
    .refine((pair) => pair.weak !== pair.strong, { message: 'Choose two different solvents.' })
    .optional(),
  phase: phaseNameSchema.optional(),
});
export type ScoutInput = z.input<typeof scoutInputSchema>;
export type ScoutInputParsed = z.output<typeof scoutInputSchema>;

/** A line of evidence: the number, what it is, and where it came from (neighbours, equation, table). */
const evidenceSchema = z.object({ quantity: z.string(), value: z.string(), source: z.string() });
export type Evidence = z.infer<typeof evidenceSchema>;

const pairSchema = z.object({ weak: z.string(), strong: z.string(), label: z.string() });

const neighbourConditionSchema = z.object({
  recordId: z.number().int().nullable(),
  phase: z.string(),
  notation: z.string(),
  strongPercent: z.number().nullable(),
  rf: z.number().nullable(),
  outcome: z.enum(['clean', 'partial', 'failed']),
  outcomeReason: z.string().nullable(),
  additives: z.array(z.string()),
  visualisations: z.array(z.string()),
  /** Invented demo record: shown with the demo mark. */
  demo: z.boolean(),
});

const neighbourSchema = z.object({
  compoundId: z.number().int(),
  name: z.string().nullable(),
  smiles: z.string(),
  /** Tanimoto coefficient on OpenChemLib fingerprints, 0–1. */
  similarity: z.number(),
  /** Share of the predicted value this neighbour carries (equivalent-kernel weight), when it took part. */
  weight: z.number().nullable(),
  conditions: z.array(neighbourConditionSchema),
});
export type Neighbour = z.infer<typeof neighbourSchema>;

const curvePointSchema = z.object({
  strongPercent: z.number(),
  rf: z.number(),
  lower: z.number(),
  upper: z.number(),
});

const suggestionSchema = z.object({
  phase: z.object({ key: z.string(), name: z.string(), why: z.string() }),
  pair: pairSchema,
  /** Strong : weak parts by volume, e.g. [1, 4]. */
  parts: z.tuple([z.number(), z.number()]),
  /** % v/v of the strong solvent. */
  strongPercent: z.number(),
  /** "EtOAc : hexanes 1 : 4". */
  notation: z.string(),
  /** "EtOAc : hexanes 1 : 4 (20 % EtOAc)". */
  label: z.string(),
  epsilon: z.number(),
  predictedRf: z.number(),
  /** 90 % interval of the Rf a plate in this eluent would show. */
  interval: z.tuple([z.number(), z.number()]),
  reach: z.enum(['within', 'too-polar', 'too-fast']),
  basis: z.enum(['neighbours-and-descriptors', 'descriptors-only']),
  borrowedFrom: pairSchema.nullable(),
  curve: z.array(curvePointSchema),
  components: z.array(z.object({ solvent: z.string(), parts: z.number() })),
});

/**
 * The first plate to run, with its additive: the compound's own best clean record when it has one
 * ('recorded'), else Scout's estimate ('model') in the pair close neighbours used, changed away from any
 * recorded failure. `summary` says it in a sentence; `notes` say why (additive, failures avoided, pair).
 */
const firstPlateSchema = z.object({
  source: z.enum(['recorded', 'model']),
  recordId: z.number().int().nullable(),
  phase: z.string(),
  phaseName: z.string(),
  /** "DCM : MeOH 10 : 1 + 1% Et3N". */
  notation: z.string(),
  /** The heading: "EtOAc : hexanes 1 : 4 (20 % EtOAc) + 1% Et3N" (parts, % strong solvent, additives). */
  label: z.string(),
  components: z.array(z.object({ solvent: z.string(), parts: z.number() })),
  additives: z.array(z.object({ additive: z.string(), label: z.string(), percent: z.number() })),
  strongPercent: z.number().nullable(),
  /** Recorded Rf ('recorded') or the expected Rf ('model'), when known. */
  rf: z.number().nullable(),
  summary: z.string(),
  notes: z.array(z.string()),
  /** The recorded plate is an invented demo record. */
  demo: z.boolean(),
});
export type FirstPlate = z.infer<typeof firstPlateSchema>;

const additiveAdviceSchema = z.object({
  additive: z.string(),
  label: z.string(),
  purpose: z.enum(['base', 'acid']),
  typicalPercent: z.tuple([z.number(), z.number()]),
  /** Neighbour records that used it, of the neighbour records considered. */
  count: z.number().int(),
  of: z.number().int(),
  recordIds: z.array(z.number().int()),
  why: z.string(),
});
export type AdditiveAdvice = z.infer<typeof additiveAdviceSchema>;

const stainAdviceSchema = z.object({
  stain: z.string(),
  label: z.string(),
  shows: z.string(),
  reasons: z.array(z.string()),
  neighbourCount: z.number().int(),
  source: z.string(),
});

const scoutWarningSchema = z.object({
  recordId: z.number().int().nullable(),
  compoundId: z.number().int(),
  compoundName: z.string().nullable(),
  similarity: z.number(),
  outcome: z.enum(['partial', 'failed']),
  notation: z.string(),
  message: z.string(),
  demo: z.boolean(),
});

const cautionSchema = z.object({ key: z.string(), title: z.string(), text: z.string() });

export const scoutResultSchema = z.object({
  query: z.object({
    canonicalSmiles: z.string(),
    formula: z.string(),
    mw: z.number(),
    clogp: z.number(),
    tpsa: z.number(),
    hbd: z.number(),
    hba: z.number(),
    classes: z.array(z.string()),
    svg: z.string(),
    existingCompoundId: z.number().int().nullable(),
  }),
  targetRf: z.number(),
  knowledge: z.object({ compounds: z.number().int(), measurements: z.number().int() }),
  /** The headline: what to run first (see firstPlateSchema); null when Scout has nothing to go on. */
  firstPlate: firstPlateSchema.nullable(),
  suggestion: suggestionSchema.nullable(),
  /** Why there is no suggestion, when there is none. */
  noSuggestion: z.string().nullable(),
  neighbours: z.array(neighbourSchema),
  additives: z.array(additiveAdviceSchema),
  stains: z.array(stainAdviceSchema),
  confidence: z.object({ level: z.enum(['high', 'medium', 'low']), reasons: z.array(z.string()) }),
  warnings: z.array(scoutWarningSchema),
  evidence: z.array(evidenceSchema),
  cautions: z.array(cautionSchema),
});
export type ScoutResult = z.infer<typeof scoutResultSchema>;
