import { z } from 'zod';
import { resolveAdditive, resolveSolvent, type Resolution } from '../catalogue/lookup';
import { parseEluent } from '../domain/eluent-notation';
import { eluentSchema, type Eluent } from './eluent-shape';

// The shapes of an eluent live in eluent-shape.ts (the notation parser needs them without this file's parser).
export * from './eluent-shape';

const namedComponentSchema = z.object({
  solvent: z.string().trim().min(1).max(60),
  parts: z.number().positive().finite(),
});
const namedAdditiveSchema = z.object({ additive: z.string().trim().min(1).max(60), percent: z.number() });

/**
 * Eluent as a client or import may send it: either a notation string ("EtOAc/hexanes 1:4 + 1% Et3N") or
 * components and additives named by any name or abbreviation. Resolve with eluentFromInputSchema.
 */
export const eluentInputSchema = z.union([
  z.string().trim().min(1).max(300),
  z.object({
    components: z.array(namedComponentSchema).min(1).max(4),
    additives: z.array(namedAdditiveSchema).max(4).default([]),
    mode: z.enum(['isocratic', 'gradient']).optional(),
    steps: z
      .array(
        z.object({
          components: z.array(namedComponentSchema).min(1).max(4),
          columnVolumes: z.number().positive().nullable().default(null),
        }),
      )
      .max(20)
      .default([]),
  }),
]);

/** Parses eluent input and resolves every name to a catalogue key; unknown names become issues with a suggestion. */
export const eluentFromInputSchema = eluentInputSchema.transform((input, context): Eluent => {
  const result = normaliseEluentInput(input);
  if (result.ok) return result.eluent;
  for (const issue of result.issues) {
    context.addIssue({
      code: 'custom',
      path: issue.path,
      message: issue.message,
      params: { unknownWord: issue.unknownWord, suggestion: issue.suggestion },
    });
  }
  return z.NEVER;
});

interface EluentInputIssue {
  path: (string | number)[];
  message: string;
  unknownWord?: string;
  suggestion?: string;
}

export type NormalisedEluent = { ok: true; eluent: Eluent } | { ok: false; issues: EluentInputIssue[] };

function keyOf<T extends { key: string }>(
  resolution: Resolution<T>,
  kind: string,
  path: (string | number)[],
  issues: EluentInputIssue[],
): string {
  if (resolution.ok) return resolution.value.key;
  const hint = resolution.suggestion ? ` Did you mean "${resolution.suggestion}"?` : '';
  issues.push({
    path,
    message: `Unknown ${kind} "${resolution.input}".${hint}`,
    unknownWord: resolution.input,
    ...(resolution.suggestion ? { suggestion: resolution.suggestion } : {}),
  });
  return resolution.input;
}

/**
 * Resolves eluent input (notation string or named components) to catalogue keys and validates it against
 * eluentSchema. Every unknown name becomes an issue naming the word and the closest known name.
 */
export function normaliseEluentInput(input: z.output<typeof eluentInputSchema>): NormalisedEluent {
  if (typeof input === 'string') {
    const parsed = parseEluent(input);
    if (!parsed.ok) return { ok: false, issues: [{ path: [], ...parsed.error }] };
    return validated(parsed.eluent);
  }
  const issues: EluentInputIssue[] = [];
  const resolveParts = (parts: { solvent: string; parts: number }[], path: (string | number)[]) =>
    parts.map((part, index) => ({
      solvent: keyOf(resolveSolvent(part.solvent), 'solvent', [...path, index, 'solvent'], issues),
      parts: part.parts,
    }));
  const candidate = {
    components: resolveParts(input.components, ['components']),
    additives: input.additives.map((item, index) => ({
      additive: keyOf(resolveAdditive(item.additive), 'additive', ['additives', index, 'additive'], issues),
      percent: item.percent,
    })),
    mode: input.mode ?? (input.steps.length > 0 ? 'gradient' : 'isocratic'),
    steps: input.steps.map((step, index) => ({
      components: resolveParts(step.components, ['steps', index, 'components']),
      columnVolumes: step.columnVolumes,
    })),
  };
  if (issues.length > 0) return { ok: false, issues };
  return validated(candidate);
}

function validated(candidate: unknown): NormalisedEluent {
  const result = eluentSchema.safeParse(candidate);
  if (result.success) return { ok: true, eluent: result.data };
  return {
    ok: false,
    issues: result.error.issues.map((issue) => ({
      path: issue.path.map((part) => (typeof part === 'symbol' ? String(part) : part)),
      message: issue.message,
    })),
  };
}
