import { z } from 'zod';
import { pageOf, paginationQuerySchema } from './common';
import { recordListItemSchema } from './record-dto';

/** Body of `POST /api/structures/parse`: SMILES or molfile text (the chemistry engine limits its size). */
export const structureParseInputSchema = z.object({
  structure: z.string().min(1, 'Give a structure (SMILES or molfile).').max(200_000),
});

/** Descriptors computed with OpenChemLib on the neutral parent (see server/chem/descriptors.ts for sources). */
const descriptorsSchema = z.object({
  formula: z.string(),
  /** g/mol */
  mw: z.number(),
  /** Da, monoisotopic */
  exactMass: z.number(),
  clogp: z.number(),
  /** Å² */
  tpsa: z.number(),
  hbd: z.number().int(),
  hba: z.number().int(),
  rotatableBonds: z.number().int(),
  aromaticRings: z.number().int(),
  stereocentres: z.number().int(),
  charge: z.number().int(),
});

export const structureParseResultSchema = descriptorsSchema.extend({
  canonicalSmiles: z.string(),
  molfile: z.string(),
  classes: z.array(z.string()),
  svg: z.string(),
  name: z.string().nullable(),
  isSalt: z.boolean(),
  isMixture: z.boolean(),
  /** The compound already in the base with this identity, if any. */
  existingCompoundId: z.number().int().nullable(),
});
export type StructureParseResult = z.infer<typeof structureParseResultSchema>;

const compoundSortKeys = ['name', 'createdAt', 'mw', 'records'] as const;

export const compoundListQuerySchema = paginationQuerySchema.extend({
  q: z.string().trim().max(200).optional(),
  class: z.string().trim().max(60).optional(),
  sort: z.enum(compoundSortKeys).default('name'),
  order: z.enum(['asc', 'desc']).default('asc'),
});

const compoundListItemSchema = z.object({
  id: z.number().int(),
  name: z.string().nullable(),
  synonyms: z.array(z.string()),
  canonicalSmiles: z.string(),
  formula: z.string(),
  mw: z.number(),
  classes: z.array(z.string()),
  recordCount: z.number().int(),
  createdAt: z.string(),
});
export type CompoundListItem = z.infer<typeof compoundListItemSchema>;

export const compoundPageSchema = pageOf(compoundListItemSchema);

/** `GET /api/compounds/:id`: the compound, its descriptors and classes, and its active records. */
export const compoundDetailSchema = compoundListItemSchema.extend({
  descriptors: descriptorsSchema,
  molfile: z.string(),
  svgUrl: z.string(),
  records: z.array(recordListItemSchema),
});
export type CompoundDetail = z.infer<typeof compoundDetailSchema>;
