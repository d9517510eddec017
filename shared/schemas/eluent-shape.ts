import { z } from 'zod';
import { additiveKeys } from '../catalogue/additives';
import { solventKeys } from '../catalogue/solvents';

/** One solvent of an eluent: catalogue key and parts by volume (e.g. EtOAc 1 : hexanes 4). */
const eluentComponentSchema = z.object({
  solvent: z.enum(solventKeys),
  parts: z.number().positive().finite(),
});
export type EluentComponent = z.infer<typeof eluentComponentSchema>;

/** An additive in % v/v of the whole eluent (e.g. 1% triethylamine). */
const additiveSchema = z.object({
  additive: z.enum(additiveKeys),
  percent: z.number().gt(0).lte(20),
});

const componentsSchema = z
  .array(eluentComponentSchema)
  .min(1)
  .max(4)
  .refine((components) => new Set(components.map((part) => part.solvent)).size === components.length, {
    message: 'Each solvent may appear only once; add its parts together.',
  });

/** One composition of a gradient, run for a number of column volumes (null when not recorded). */
const gradientStepSchema = z.object({
  components: componentsSchema,
  columnVolumes: z.number().positive().finite().nullable(),
});

/**
 * An eluent. Isocratic: `components` is the mixture and `steps` is empty. Gradient: `steps` lists two or
 * more compositions in running order and `components` repeats the final one.
 */
export const eluentSchema = z
  .object({
    components: componentsSchema,
    additives: z.array(additiveSchema).max(4).default([]),
    mode: z.enum(['isocratic', 'gradient']).default('isocratic'),
    steps: z.array(gradientStepSchema).max(20).default([]),
  })
  .superRefine((eluent, context) => {
    if (new Set(eluent.additives.map((item) => item.additive)).size !== eluent.additives.length) {
      context.addIssue({ code: 'custom', path: ['additives'], message: 'Each additive may appear only once.' });
    }
    if (eluent.mode === 'gradient' && eluent.steps.length < 2) {
      context.addIssue({ code: 'custom', path: ['steps'], message: 'A gradient needs at least two steps.' });
    }
    if (eluent.mode === 'isocratic' && eluent.steps.length > 0) {
      context.addIssue({ code: 'custom', path: ['steps'], message: 'An isocratic eluent has no gradient steps.' });
    }
  });
export type Eluent = z.output<typeof eluentSchema>;
