import { z } from 'zod';
import { recordListItemSchema } from './record-dto';
import { outcomes } from './record-parts';

const outcomeCountsSchema = z.object({ clean: z.number().int(), partial: z.number().int(), failed: z.number().int() });
export type OutcomeCounts = z.infer<typeof outcomeCountsSchema>;

const classInfo = {
  key: z.string(),
  name: z.string(),
  description: z.string(),
  group: z.string(),
  /** Compounds of the class with at least one active record. */
  compoundCount: z.number().int(),
  /** Active records of those compounds. */
  recordCount: z.number().int(),
  outcomes: outcomeCountsSchema,
};

/** `GET /api/classes`: every class of the catalogue with how much the group knows about it. */
export const classIndexSchema = z.object({ items: z.array(z.object(classInfo)) });
export type ClassIndex = z.infer<typeof classIndexSchema>;
export type ClassIndexItem = ClassIndex['items'][number];

/** How often something (a stain, an additive) was used in the class's records, and how often the record went clean or partial. */
const usageSchema = z.object({
  key: z.string(),
  label: z.string(),
  records: z.number().int(),
  worked: z.number().int(),
});
export type Usage = z.infer<typeof usageSchema>;

/** One solvent combination used for the class (gradients count by their final mixture). */
const solventPairSchema = z.object({
  solvents: z.array(z.string()),
  labels: z.array(z.string()),
  records: z.number().int(),
  outcomes: outcomeCountsSchema,
  /** Range of % v/v strong solvent, when known. */
  strongPercent: z.tuple([z.number(), z.number()]).nullable(),
});

/** Snyder's ε° of one record's eluent on its adsorbent (shared/domain/eluent-strength.ts). */
const strengthPointSchema = z.object({
  recordId: z.number().int(),
  epsilon: z.number(),
  outcome: z.enum(outcomes),
  demo: z.boolean(),
});

/** A record's % strong solvent and target Rf in the class's most used pair (for the scatter). */
const rfPointSchema = z.object({
  recordId: z.number().int(),
  strongPercent: z.number(),
  rf: z.number(),
  outcome: z.enum(outcomes),
  demo: z.boolean(),
});

/** `GET /api/classes/:key`. */
export const classDetailSchema = z.object({
  ...classInfo,
  /** The class's defining fragments (SMILES read in fragment mode). */
  fragments: z.array(z.string()),
  solventPairs: z.array(solventPairSchema),
  strength: z.object({
    adsorbent: z.enum(['silica', 'alumina']),
    points: z.array(strengthPointSchema),
    /** Records whose ε° could not be computed (reversed phase, or a solvent without ε° in the catalogue). */
    skipped: z.number().int(),
    /** Where the numbers come from: the equation and the adsorbent activity used. */
    source: z.string(),
  }),
  rf: z.object({ pair: z.array(z.string()), points: z.array(rfPointSchema) }).nullable(),
  stains: z.array(usageSchema),
  additives: z.array(usageSchema),
  /** The newest active records of the class (all of them through the search page link). */
  records: z.array(recordListItemSchema),
});
export type ClassDetail = z.infer<typeof classDetailSchema>;

/** Path of `GET /api/classes/:key`. */
export const classKeyParamSchema = z.object({ key: z.string().trim().min(1).max(60) });
