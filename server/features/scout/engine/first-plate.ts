import { additiveByKey } from '../../../../shared/catalogue/additives';
import { stationaryPhaseByKey } from '../../../../shared/catalogue/stationary-phases';
import { formatEluent } from '../../../../shared/domain/eluent-summary';
import { rfToRm } from '../../../../shared/domain/rf';
import type { FirstPlate } from '../../../../shared/schemas/scout';
import { chooseAdditives, type HeadlineAdditive } from './headline-additives';
import { adsorbentOf, positionOf } from './eluent-position';
import { formatPercent, measurementNotation, ratioLabel, two } from './format';
import { formatParts } from '../../../../shared/domain/format-number';
import { requireSolvent } from '../../../../shared/catalogue/solvents';
import { groupsQueryLacks, ionisableGroups, type IonisableGroups } from './ionisable';
import type { ScoutModel } from './model';
import type { SimilarCompound } from './neighbours';
import type { RatioSuggestion } from './suggest-ratio';
import type { ScoutMeasurement, ScoutOptions, ScoutQuery, SolventPair } from './types';

/**
 * Neighbours at least this similar count as "very close": their failures steer the first plate (on the fused scale,
 * para-substituted analogues score 0.77–0.82).
 */
const veryCloseSimilarity = 0.75;

type Components = { solvent: string; parts: number }[];

interface Draft {
  phase: string;
  components: Components;
  additives: HeadlineAdditive[];
}

/** Phase keys of one adsorbent family count as one (a silica TLC plate and silica gel in a column). */
const samePhaseFamily = (a: string, b: string) =>
  a === b || (adsorbentOf(a) !== null && adsorbentOf(a) === adsorbentOf(b));

const solventSet = (components: readonly { solvent: string; parts: number }[]) =>
  components
    .filter((part) => part.parts > 0)
    .map((part) => part.solvent)
    .sort()
    .join('|');

function strongFractionOf(components: readonly { solvent: string; parts: number }[], phase: string): number | null {
  const adsorbent = adsorbentOf(phase);
  if (!adsorbent) return null;
  const position = positionOf(components, adsorbent);
  return position?.kind === 'pair' ? position.strongFraction : null;
}

const purposes = (additives: readonly { additive: string }[]) =>
  [...new Set(additives.map((item) => additiveByKey(item.additive)?.purpose ?? item.additive))].sort().join('|');

/**
 * A failed record "is" the draft when phase family, solvents and additive purposes agree and the strong solvent's
 * fraction lies within a factor of two of the failed one (common practice: a ratio step or two either side).
 */
function repeatsFailure(draft: Draft, failure: ScoutMeasurement): boolean {
  if (!samePhaseFamily(draft.phase, failure.phase) || solventSet(draft.components) !== solventSet(failure.components))
    return false;
  if (purposes(draft.additives) !== purposes(failure.additives)) return false;
  const a = strongFractionOf(draft.components, draft.phase);
  const b = strongFractionOf(failure.components, failure.phase);
  if (a === null || b === null) return true;
  return Math.max(a, b) <= 2 * Math.min(a, b) + 1e-9;
}

/** "EtOAc : hexanes 1 : 4 (20 % EtOAc) + 1% Et3N": parts, the strong solvent's % (as ratios are shown everywhere), then additives. */
function headlineLabel(
  components: Components,
  additives: readonly HeadlineAdditive[],
  phase: string,
  notation: string,
): string {
  const extras = additives.map((item) => ` + ${formatParts(item.percent)}% ${item.label}`).join('');
  const present = components.filter((part) => part.parts > 0);
  if (present.length === 1) return `100 % ${requireSolvent(present[0].solvent).label}${extras}`;
  const adsorbent = adsorbentOf(phase);
  const position = adsorbent ? positionOf(present, adsorbent) : null;
  if (position?.kind !== 'pair') return notation;
  const mixture = formatEluent({ components: present, additives: [], mode: 'isocratic', steps: [] });
  return `${mixture} (${formatPercent(100 * position.strongFraction)} % ${requireSolvent(position.pair.strong).label})${extras}`;
}

const headlineAdditives = (measurement: ScoutMeasurement): HeadlineAdditive[] =>
  measurement.additives.map((item) => ({
    additive: item.additive,
    label: additiveByKey(item.additive)?.label ?? item.additive,
    percent: item.percent,
  }));

const who = (model: ScoutModel, index: number) => model.compounds[index].name ?? model.compounds[index].smiles;
const recordName = (measurement: ScoutMeasurement) =>
  measurement.recordId ? `record #${measurement.recordId}` : 'a record';

/** The query's own best clean record: its Rf nearest the target (in RM), on the asked phase and pair; the newest on ties. */
function ownBestRecord(
  model: ScoutModel,
  own: number,
  options: ScoutOptions,
  targetRf: number,
): ScoutMeasurement | null {
  const pair = options.solventPair ? [options.solventPair.weak, options.solventPair.strong].sort().join('|') : null;
  const fitsPair = (item: ScoutMeasurement) =>
    !pair || solventSet(item.components) === pair || pair.split('|').includes(solventSet(item.components));
  const candidates = model.measurementsOf[own].filter(
    (item) =>
      item.outcome === 'clean' && (!options.phase || samePhaseFamily(item.phase, options.phase)) && fitsPair(item),
  );
  const score = (item: ScoutMeasurement) =>
    (item.rf === null ? 3 : Math.abs(rfToRm(Math.min(0.99, Math.max(0.01, item.rf))) - rfToRm(targetRf))) +
    (item.mode === 'gradient' ? 0.5 : 0);
  return candidates.sort((a, b) => score(a) - score(b) || (b.recordId ?? 0) - (a.recordId ?? 0))[0] ?? null;
}

interface Failure {
  measurement: ScoutMeasurement;
  index: number;
  similarity: number;
}

/** Failed records of the query itself and of very close neighbours whose groups the query shares (rule: failures are knowledge). */
function relevantFailures(
  model: ScoutModel,
  own: number | undefined,
  ranked: readonly SimilarCompound[],
  groups: IonisableGroups,
): Failure[] {
  const sources = ranked.filter((item) => item.index === own || item.similarity >= veryCloseSimilarity).slice(0, 12);
  return sources.flatMap(({ index, similarity }) => {
    if (index !== own && groupsQueryLacks(groups, ionisableGroups(model.compounds[index])).length > 0) return [];
    return model.measurementsOf[index]
      .filter((item) => item.outcome === 'failed')
      .map((measurement) => ({ measurement, index, similarity: index === own ? 1 : similarity }));
  });
}

export interface FirstPlateInput {
  model: ScoutModel;
  query: ScoutQuery;
  ranked: readonly SimilarCompound[];
  suggestion: RatioSuggestion | null;
  phase: { key: string; name: string };
  options: ScoutOptions;
  targetRf: number;
  /** A model suggestion in another pair (for switching away from a pair that failed); null when there is none. */
  suggestIn: (pair: SolventPair) => RatioSuggestion | null;
  /** What the pair choice said about the neighbours' pairs ("close neighbours were purified in …"). */
  pairNote: string | null;
}

/**
 * The first plate a chemist should run — the headline. Rule 1: the compound's own best clean record when it has
 * one, said plainly; else the model's ratio in the pair the close neighbours were purified in. Rule 3: the
 * additive follows the query's own groups. Rule 2: if the draft repeats a recorded failure of the compound or a
 * very close neighbour, it changes the way the records show worked (an additive, another pair or phase) and says so.
 */
export function firstPlate(input: FirstPlateInput): FirstPlate | null {
  const { model, query, ranked, suggestion, options, targetRf } = input;
  const own = query.id !== null ? model.indexOf(query.id) : undefined;
  const groups = ionisableGroups(query);
  const notes: string[] = [];
  const recorded = own !== undefined ? ownBestRecord(model, own, options, targetRf) : null;
  if (recorded) {
    const notation = measurementNotation(recorded);
    const failedHere = model.measurementsOf[own!].filter((item) => item.outcome === 'failed');
    if (failedHere.length > 0)
      notes.push(
        `Not ${failedHere
          .map(
            (item) =>
              `${measurementNotation(item)} (${recordName(item)}: ` +
              `failed${item.outcomeReason ? ` — ${item.outcomeReason}` : ''})`,
          )
          .join('; ')}.`,
      );
    if (suggestion)
      notes.push(
        `Second opinion, Scout's estimate from the neighbours: ${ratioLabel(suggestion.pair, suggestion.parts).notation} ` +
          `for Rf ${two(targetRf)} (expected ${two(suggestion.rf)}).`,
      );
    return {
      source: 'recorded',
      recordId: recorded.recordId,
      phase: recorded.phase,
      phaseName: stationaryPhaseByKey(recorded.phase)?.name ?? recorded.phase,
      notation,
      label:
        recorded.mode === 'gradient'
          ? notation
          : headlineLabel([...recorded.components], headlineAdditives(recorded), recorded.phase, notation),
      components: recorded.components.map((part) => ({ ...part })),
      additives: headlineAdditives(recorded),
      strongPercent: (() => {
        const f = strongFractionOf(recorded.components, recorded.phase);
        return f === null ? null : 100 * f;
      })(),
      rf: recorded.rf,
      demo: recorded.demo === true,
      summary: `Purified before: ${recordName(recorded)}${recorded.rf !== null ? `, Rf ${two(recorded.rf)}` : ''} in ${notation}.`,
      notes,
    };
  }
  if (!suggestion) return null;
  const chosen = chooseAdditives(model, query, ranked, groups);
  notes.push(...chosen.notes);
  let draft: Draft = {
    phase: input.phase.key,
    components: suggestion.found.pair ? labelComponents(suggestion) : [],
    additives: chosen.additives,
  };
  let rf: number | null = suggestion.rf;
  const failures = relevantFailures(model, own, ranked, groups);
  for (let round = 0; round < 3; round++) {
    const hit = failures.find((failure) => repeatsFailure(draft, failure.measurement));
    if (!hit) break;
    const fixed = remedy(input, draft, hit, groups);
    notes.push(fixed.note);
    if (fixed.rf !== undefined) rf = fixed.rf;
    draft = fixed.draft;
  }
  if (input.pairNote) notes.unshift(input.pairNote);
  const notation = formatEluent({
    components: draft.components,
    additives: draft.additives.map(({ additive, percent }) => ({ additive, percent })),
    mode: 'isocratic',
    steps: [],
  });
  const fraction = strongFractionOf(draft.components, draft.phase);
  return {
    source: 'model',
    recordId: null,
    phase: draft.phase,
    phaseName: stationaryPhaseByKey(draft.phase)?.name ?? draft.phase,
    notation,
    label: headlineLabel(draft.components, draft.additives, draft.phase, notation),
    components: draft.components,
    additives: draft.additives,
    strongPercent: fraction === null ? null : 100 * fraction,
    rf,
    demo: false,
    summary: `Scout's estimate: ${notation}${rf !== null ? `, expected Rf ${two(rf)}` : ''}.`,
    notes,
  };
}

const labelComponents = (suggestion: RatioSuggestion): Components => {
  const [strong, weak] = suggestion.parts;
  if (weak === 0) return [{ solvent: suggestion.pair.strong, parts: 1 }];
  if (strong === 0) return [{ solvent: suggestion.pair.weak, parts: 1 }];
  return [
    { solvent: suggestion.pair.strong, parts: strong },
    { solvent: suggestion.pair.weak, parts: weak },
  ];
};

/** How the records say the failure was overcome, applied to the draft, with the sentence that says so. */
function remedy(
  input: FirstPlateInput,
  draft: Draft,
  failure: Failure,
  groups: IonisableGroups,
): { draft: Draft; note: string; rf?: number | null } {
  const { model } = input;
  const failed = failure.measurement;
  const whose =
    failure.similarity >= 1 ? 'this compound' : `${who(model, failure.index)} (similarity ${two(failure.similarity)})`;
  const said =
    `${recordName(failed)} of ${whose} failed in ` +
    `${measurementNotation(failed)}${failed.outcomeReason ? ` (${failed.outcomeReason.replace(/\.$/, '')})` : ''}`;
  const cleans = model.measurementsOf[failure.index].filter((item) => item.outcome === 'clean');
  const failedPurposes = new Set(failed.additives.map((item) => additiveByKey(item.additive)?.purpose));
  const withAdditive = cleans.find(
    (item) =>
      samePhaseFamily(item.phase, failed.phase) &&
      item.additives.some((a) => !failedPurposes.has(additiveByKey(a.additive)?.purpose)),
  );
  if (withAdditive) {
    const added = headlineAdditives(withAdditive).filter(
      (a) => !failedPurposes.has(additiveByKey(a.additive)?.purpose),
    );
    const additives = [
      ...draft.additives.filter(
        (a) => !added.some((b) => additiveByKey(b.additive)?.purpose === additiveByKey(a.additive)?.purpose),
      ),
      ...added,
    ];
    return {
      draft: { ...draft, additives },
      note:
        `${said}; its clean ${recordName(withAdditive)} added ${added.map((a) => `${a.percent} % ${a.label}`).join(' and ')}, ` +
        `so this plate does too.`,
    };
  }
  const otherPair = cleans.find(
    (item) =>
      samePhaseFamily(item.phase, failed.phase) && solventSet(item.components) !== solventSet(failed.components),
  );
  const adsorbent = adsorbentOf(draft.phase);
  if (otherPair && adsorbent) {
    const position = positionOf(otherPair.components, adsorbent);
    const modelled = position?.kind === 'pair' ? input.suggestIn(position.pair) : null;
    const components = modelled ? labelComponents(modelled) : otherPair.components.map((part) => ({ ...part }));
    return {
      draft: { ...draft, components },
      rf: modelled ? modelled.rf : null,
      note:
        `${said}; its clean ${recordName(otherPair)} used ${measurementNotation(otherPair)}, so ` +
        `this plate switches to that pair${modelled ? ' at the ratio the model gives for the target' : ''}.`,
    };
  }
  const otherPhase = cleans.find((item) => !samePhaseFamily(item.phase, failed.phase));
  if (otherPhase) {
    return {
      draft: {
        ...draft,
        phase: otherPhase.phase,
        components: otherPhase.components.map((part) => ({ ...part })),
        additives: headlineAdditives(otherPhase),
      },
      rf: otherPhase.rf,
      note:
        `${said}; its clean ${recordName(otherPhase)} ran on ` +
        `${stationaryPhaseByKey(otherPhase.phase)?.name ?? otherPhase.phase}, so this plate does too.`,
    };
  }
  const purpose = (['base', 'acid'] as const).find((group) => groups[group] && !failedPurposes.has(group));
  if (purpose) {
    const additive = additiveByKey(purpose === 'base' ? 'triethylamine' : 'acetic-acid')!;
    return {
      draft: {
        ...draft,
        additives: [...draft.additives, { additive: additive.key, label: additive.label, percent: 1 }],
      },
      note:
        `${said}; nothing clean is recorded for it, and the query has ` +
        `${purpose === 'base' ? 'a basic nitrogen' : 'an acid'}, so this plate adds 1 % ${additive.label} (common practice).`,
    };
  }
  const pair =
    strongFractionOf(draft.components, draft.phase) !== null && adsorbent
      ? positionOf(draft.components, adsorbent)
      : null;
  const alternative: SolventPair =
    pair?.kind === 'pair' && pair.pair.strong === 'methanol'
      ? { weak: 'hexanes', strong: 'ethyl-acetate' }
      : { weak: 'dichloromethane', strong: 'methanol' };
  const modelled = input.suggestIn(alternative);
  if (modelled)
    return {
      draft: { ...draft, components: labelComponents(modelled) },
      rf: modelled.rf,
      note: `${said}; nothing clean is recorded for it, so this plate tries another pair.`,
    };
  return {
    draft,
    note: `${said}; nothing recorded shows what worked instead — run a second plate in another pair beside this one.`,
  };
}
