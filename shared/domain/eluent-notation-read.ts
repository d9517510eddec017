import { additiveByKey } from '../catalogue/additives';
import { requireSolvent } from '../catalogue/solvents';
import type { Atom, NameToken, Value } from './eluent-notation-atoms';

export interface Composition {
  components: { solvent: string; parts: number }[];
  columnVolumes: number | null;
}

export interface SegmentReading {
  steps: Composition[];
  additives: { additive: string; percent: number }[];
}

export class NotationError extends Error {}

export type Slot = { atom: Atom; used: boolean };
export const label = (name: NameToken) =>
  name.role === 'solvent' ? requireSolvent(name.key).label : (additiveByKey(name.key)?.label ?? name.key);

/** The nearest slot before (step −1) or after (+1) `index`, skipping the kinds given. */
function neighbour(slots: Slot[], index: number, step: -1 | 1, skip: readonly string[]): Slot | undefined {
  let at = index + step;
  while (slots[at] && skip.includes(slots[at].atom.kind)) at += step;
  return slots[at];
}

const singlePercent = (slot: Slot | undefined) =>
  slot &&
  !slot.used &&
  slot.atom.kind === 'value' &&
  slot.atom.value.type === 'percent' &&
  slot.atom.value.steps.length === 1
    ? slot
    : undefined;

/** Additives written with their amount beside them: "+ 1% Et3N", "Et3N (0.5%)". */
export function takeAdditives(slots: Slot[]): { additive: string; percent: number }[] {
  const found: { additive: string; percent: number }[] = [];
  slots.forEach((slot, index) => {
    if (slot.atom.kind !== 'name' || slot.atom.name.role !== 'additive') return;
    const amount =
      singlePercent(neighbour(slots, index, -1, ['open', 'plus', 'sep'])) ??
      singlePercent(neighbour(slots, index, 1, ['open']));
    if (!amount) return;
    const percent = (amount.atom as { value: { steps: number[] } }).value.steps[0];
    if (!(percent > 0 && percent <= 20))
      throw new NotationError(`${label(slot.atom.name)} at ${percent}% is outside 0–20% v/v.`);
    slot.used = true;
    amount.used = true;
    found.push({ additive: slot.atom.name.key, percent });
  });
  return found;
}

/** Parts per named component for each gradient step, from a ratio "1:4" or from per-name numbers "EtOAc 1 : hexanes 4". */
export function partsFromNumbers(slots: Slot[], names: Slot[]): number[][] | null {
  const ratio = slots.filter((slot) => slot.atom.kind === 'value' && slot.atom.value.type === 'ratio');
  if (ratio.length > 1) throw new NotationError('Write one ratio per eluent (or one per gradient step, joined by →).');
  if (ratio.length === 1) {
    ratio[0].used = true;
    const steps = (ratio[0].atom as { value: Extract<Value, { type: 'ratio' }> }).value.steps;
    const solventCount = names.filter((name) => (name.atom as { name: NameToken }).name.role === 'solvent').length;
    const unpriced = names.find((name) => (name.atom as { name: NameToken }).name.role === 'additive');
    if (unpriced && steps[0].length === solventCount) {
      const text = label((unpriced.atom as { name: NameToken }).name);
      throw new NotationError(`Give the amount of ${text}, e.g. "+ 1% ${text}".`);
    }
    if (steps[0].length !== names.length) {
      throw new NotationError(
        `${names.length} solvent${names.length === 1 ? '' : 's'} but ${steps[0].length} numbers in the ratio.`,
      );
    }
    return steps;
  }
  const numbers = slots.filter((slot) => slot.atom.kind === 'value' && slot.atom.value.type === 'number');
  if (numbers.length === 0 || numbers.length !== names.length) return null;
  for (const direction of [1, -1] as const) {
    const paired = names.map((name) => neighbour(slots, slots.indexOf(name), direction, ['open']));
    if (paired.every((slot, index) => slot === numbers[index])) {
      numbers.forEach((slot) => (slot.used = true));
      return [numbers.map((slot) => (slot.atom as { value: { value: number } }).value.value)];
    }
  }
  return null;
}

const polarity = (slot: Slot) => {
  const { name } = slot.atom as { name: NameToken };
  return name.role === 'solvent' ? (requireSolvent(name.key).strength.silica?.value ?? -1) : -1;
};

/**
 * The name a percentage belongs to: X in "p% X in Y" or "X in Y p%"; the most polar solvent for a lone
 * percentage after the list ("EtOAc/hexanes 0–30%", since chemists quote the polar share; common practice);
 * otherwise the name next to it.
 */
function owner(slots: Slot[], index: number): Slot | undefined {
  const inAt = slots.findIndex((slot) => slot.atom.kind === 'in');
  const names = slots.filter((slot) => slot.atom.kind === 'name' && !slot.used);
  const before = inAt < 0 ? undefined : names.filter((slot) => slots.indexOf(slot) < inAt).pop();
  const percents = slots.filter(
    (slot) => slot.atom.kind === 'value' && slot.atom.value.type === 'percent' && !slot.used,
  );
  if (before && percents.length === 1) return before;
  if (percents.length === 1 && names.length > 1 && index > slots.indexOf(names[names.length - 1])) {
    return names.reduce((best, slot) => (polarity(slot) > polarity(best) ? slot : best));
  }
  const isName = (slot: Slot | undefined) => (slot && slot.atom.kind === 'name' && !slot.used ? slot : undefined);
  return isName(neighbour(slots, index, 1, ['open'])) ?? isName(neighbour(slots, index, -1, ['open', 'close']));
}

/** Per-step percentages of each name from "20% EtOAc in hexanes", "5% MeOH/DCM", "EtOAc in hexanes 0→30%". */
export function partsFromPercents(slots: Slot[], names: Slot[]): number[][] | null {
  const percents = slots.filter(
    (slot) => slot.atom.kind === 'value' && slot.atom.value.type === 'percent' && !slot.used,
  );
  if (percents.length === 0) return null;
  const given = new Map<Slot, number[]>();
  for (const slot of percents) {
    const name = owner(slots, slots.indexOf(slot));
    const steps = (slot.atom as { value: { steps: number[] } }).value.steps;
    if (!name || given.has(name))
      throw new NotationError(`Cannot tell which solvent ${steps.join(' → ')}% belongs to.`);
    given.set(name, steps);
    slot.used = true;
  }
  const stepCount = Math.max(...[...given.values()].map((steps) => steps.length));
  const rest = names.filter((name) => !given.has(name));
  if (rest.length > 1)
    throw new NotationError(
      `Give the amount of ${rest.map((slot) => label((slot.atom as { name: NameToken }).name)).join(' and ')} too, or a ratio.`,
    );
  return Array.from({ length: stepCount }, (_, step) => {
    const value = (name: Slot) => {
      const steps = given.get(name) as number[];
      return steps[Math.min(step, steps.length - 1)];
    };
    const total = [...given.keys()].reduce((sum, name) => sum + value(name), 0);
    if (rest.length === 0 && Math.abs(total - 100) > 1)
      throw new NotationError(`The percentages add up to ${total}%, not 100%.`);
    if (total > 100 + 1e-9) throw new NotationError(`The percentages add up to ${total}%, more than 100%.`);
    return names.map((name) => (given.has(name) ? value(name) : 100 - total));
  });
}
