import { additiveByKey } from '../catalogue/additives';
import { eluentNameIndex } from '../catalogue/lookup';
import { requireSolvent } from '../catalogue/solvents';
import type { Eluent, EluentComponent } from '../schemas/eluent-shape';
import { formatNumber } from './format-number';
import { toAtoms, type Atom } from './eluent-notation-atoms';
import { NotationError } from './eluent-notation-read';
import { tokenise } from './eluent-notation-scan';
import { readSegment } from './eluent-notation-segment';

interface EluentParseError {
  message: string;
  /** The word that names no known solvent or additive. */
  unknownWord?: string;
  /** The closest known name to `unknownWord`. */
  suggestion?: string;
}

export type EluentParse = { ok: true; eluent: Eluent } | { ok: false; error: EluentParseError };

const fail = (message: string): EluentParse => ({ ok: false, error: { message } });

function splitSegments(atoms: readonly Atom[]): Atom[][] {
  const segments: Atom[][] = [[]];
  for (const atom of atoms) {
    if (atom.kind === 'segment') segments.push([]);
    else segments[segments.length - 1].push(atom);
  }
  return segments;
}

/**
 * Reads an eluent as written in lab notebooks and spreadsheets (common practice notations):
 * "EtOAc/hexanes 1:4", "hexane:EtOAc, 9:1", "20% EtOAc in hexanes", "5% MeOH/DCM", "DCM/MeOH 9:1 + 1% Et3N",
 * "100% DCM", "1:1 Et2O:hexane", "PE/EA 10:1", "hexanes–EtOAc (3:1)", gradients "EtOAc in hexanes 0→30%",
 * "hexanes/EtOAc 9:1 → 1:1" and formatEluent's own output. Names and abbreviations match in any case.
 * Percentages are % v/v of the solvent mixture; additive amounts are % v/v of the eluent.
 */
export function parseEluent(notation: string): EluentParse {
  if (!notation.trim()) return fail('Enter an eluent, e.g. "EtOAc/hexanes 1:4".');
  const tokens = tokenise(notation);
  if ('unexpected' in tokens) return fail(`Unexpected character "${tokens.unexpected}" in the eluent.`);
  const unknown = tokens.find((token) => token.kind === 'unknown');
  if (unknown) {
    const suggestion = eluentNameIndex.suggest(unknown.text);
    const hint = suggestion ? ` Did you mean "${suggestion}"?` : '';
    return {
      ok: false,
      error: {
        message: `Unknown solvent or additive "${unknown.text}".${hint}`,
        unknownWord: unknown.text,
        ...(suggestion ? { suggestion } : {}),
      },
    };
  }
  const atoms = toAtoms(tokens);
  if ('error' in atoms) return fail(atoms.error);
  const segments = splitSegments(atoms);
  if (segments.some((segment) => segment.length === 0))
    return fail('An arrow must stand between two compositions, e.g. "hexanes → EtOAc/hexanes 1:1".');
  try {
    const readings = segments.map(readSegment);
    const steps = readings.flatMap((reading) => reading.steps);
    const additives = new Map<string, number>();
    for (const { additive, percent } of readings.flatMap((reading) => reading.additives)) {
      if (additives.has(additive) && additives.get(additive) !== percent)
        throw new NotationError(`${additiveByKey(additive)?.label} is given two different amounts.`);
      additives.set(additive, percent);
    }
    if (steps.length === 1 && atoms.some((atom) => atom.kind === 'gradient')) {
      throw new NotationError('A gradient needs a start and an end, e.g. "EtOAc in hexanes 0→30%".');
    }
    if (steps.some((step) => step.components.length > 4))
      throw new NotationError('An eluent holds at most four solvents.');
    if (additives.size > 4) throw new NotationError('An eluent holds at most four additives.');
    const gradient = steps.length > 1;
    return {
      ok: true,
      eluent: {
        components: steps[steps.length - 1].components,
        additives: [...additives].map(([additive, percent]) => ({ additive, percent })),
        mode: gradient ? 'gradient' : 'isocratic',
        steps: gradient ? steps : [],
      },
    };
  } catch (error) {
    if (error instanceof NotationError) return fail(error.message);
    throw error;
  }
}

function strengthOrder(solvent: string): number | null {
  const { strength } = requireSolvent(solvent);
  return strength.silica?.value ?? strength.alumina?.value ?? null;
}

/** "EtOAc : hexanes 1 : 4 (20% EtOAc)": labels, parts, and the % v/v of every solvent but the weakest. */
export function formatComposition(components: readonly EluentComponent[]): string {
  const labels = components.map((part) => requireSolvent(part.solvent).label);
  if (components.length === 1) return labels[0];
  const total = components.reduce((sum, part) => sum + part.parts, 0);
  const strengths = components.map((part) => strengthOrder(part.solvent));
  const base = strengths.every((value) => value !== null)
    ? strengths.indexOf(Math.min(...(strengths as number[])))
    : components.reduce((best, part, index) => (part.parts > components[best].parts ? index : best), 0);
  const shares = components
    .map((part, index) => (index === base ? null : `${formatNumber((100 * part.parts) / total, 1)}% ${labels[index]}`))
    .filter((share) => share !== null);
  return `${labels.join(' : ')} ${components.map((part) => formatNumber(part.parts)).join(' : ')} (${shares.join(', ')})`;
}

/** An eluent as one line that parseEluent reads back, e.g. "DCM : MeOH 9 : 1 (10% MeOH) + 1% Et3N". */
export function formatEluent(eluent: Eluent): string {
  const body =
    eluent.mode === 'gradient'
      ? eluent.steps
          .map(
            (step) =>
              `${formatComposition(step.components)}${step.columnVolumes === null ? '' : `, ${formatNumber(step.columnVolumes)} CV`}`,
          )
          .join(' → ')
      : formatComposition(eluent.components);
  const extras = eluent.additives.map(
    (item) => ` + ${formatNumber(item.percent)}% ${additiveByKey(item.additive)?.label ?? item.additive}`,
  );
  return body + extras.join('');
}
