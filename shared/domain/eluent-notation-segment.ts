import type { Atom, NameToken, Value } from './eluent-notation-atoms';
import {
  label,
  NotationError,
  partsFromNumbers,
  partsFromPercents,
  takeAdditives,
  type Composition,
  type SegmentReading,
  type Slot,
} from './eluent-notation-read';

const nameOf = (slot: Slot) => (slot.atom as { name: NameToken }).name;

/** "(20% EtOAc)" after the solvents restates a share; such groups are set aside and checked against the parts. */
function takeAnnotations(slots: Slot[]): Map<string, number> {
  const shares = new Map<string, number>();
  slots.forEach((slot, index) => {
    const end = slots.findIndex((other, at) => at > index && other.atom.kind === 'close');
    if (slot.atom.kind !== 'open' || end < 0) return;
    const inner = slots.slice(index + 1, end);
    const pairs: [string, number][] = [];
    for (let at = 0; at < inner.length; at += 1) {
      const atom = inner[at].atom;
      const next = inner[at + 1]?.atom;
      if (atom.kind === 'sep') continue;
      if (
        atom.kind !== 'value' ||
        atom.value.type !== 'percent' ||
        atom.value.steps.length !== 1 ||
        next?.kind !== 'name'
      )
        return;
      pairs.push([next.name.key, atom.value.steps[0]]);
      at += 1;
    }
    const namedBefore = new Set(
      slots.slice(0, index).flatMap((other) => (other.atom.kind === 'name' ? [other.atom.name.key] : [])),
    );
    if (pairs.length === 0 || !pairs.every(([key]) => namedBefore.has(key))) return;
    inner.forEach((other) => (other.used = true));
    for (const [key, percent] of pairs) shares.set(key, percent);
  });
  return shares;
}

function checkAnnotations(shares: Map<string, number>, names: Slot[], steps: number[][]): void {
  if (shares.size === 0) return;
  if (steps.length > 1) throw new NotationError('Write the percentage of each gradient step beside that step.');
  const solventTotal = steps[0].reduce(
    (sum, parts, index) => sum + (nameOf(names[index]).role === 'solvent' ? parts : 0),
    0,
  );
  for (const [key, stated] of shares) {
    const index = names.findIndex((slot) => nameOf(slot).key === key);
    const share = (100 * steps[0][index]) / solventTotal;
    if (Math.abs(share - stated) > 1) {
      throw new NotationError(
        `The ratio gives ${Math.round(share * 10) / 10}% ${label(nameOf(names[index]))}, but ${stated}% is written.`,
      );
    }
  }
}

function describe(slot: Slot): string {
  const value = (slot.atom as { value: Value }).value;
  if (value.type === 'number') return `"${value.value}"`;
  if (value.type === 'percent') return `"${value.steps.join(' → ')}%"`;
  return `"${value.steps.map((step) => step.join(':')).join(' → ')}"`;
}

function columnVolumesOf(slots: Slot[]): number | null {
  const marks = slots.filter((slot) => slot.atom.kind === 'cv');
  if (marks.length > 1) throw new NotationError('Give one column-volume count per gradient step.');
  return marks.length === 1 ? (marks[0].atom as { value: number }).value : null;
}

/** Reads one isocratic composition or one gradient chain ("EtOAc in hexanes 0→30%") with its additives. */
export function readSegment(atoms: readonly Atom[]): SegmentReading {
  const slots: Slot[] = atoms.map((atom) => ({ atom, used: false }));
  const additives = takeAdditives(slots);
  const shares = takeAnnotations(slots);
  const names = slots.filter((slot) => slot.atom.kind === 'name' && !slot.used);
  if (!names.some((slot) => nameOf(slot).role === 'solvent')) throw new NotationError('No solvent is named.');
  const keys = names.map((slot) => nameOf(slot).key);
  const twice = keys.find((key, index) => keys.indexOf(key) !== index);
  if (twice) throw new NotationError(`${label(nameOf(names[keys.indexOf(twice)]))} is named twice.`);

  const unpriced = names.find((slot) => nameOf(slot).role === 'additive');
  const hasParts = slots.some((slot) => slot.atom.kind === 'value' && slot.atom.value.type !== 'percent');
  if (unpriced && !hasParts)
    throw new NotationError(`Give the amount of ${label(nameOf(unpriced))}, e.g. "+ 1% ${label(nameOf(unpriced))}".`);

  let steps = partsFromNumbers(slots, names) ?? partsFromPercents(slots, names);
  if (!steps) {
    if (names.length > 1)
      throw new NotationError(
        `Give the ratio of ${names.map((slot) => label(nameOf(slot))).join(' and ')}, e.g. ` +
          `"${names.map((slot) => label(nameOf(slot))).join('/')} 1:4".`,
      );
    steps = [[1]];
  }
  checkAnnotations(shares, names, steps);
  const leftover = slots.find((slot) => !slot.used && slot.atom.kind === 'value');
  if (leftover)
    throw new NotationError(
      `Cannot tell what ${describe(leftover)} refers to; write a ratio (a:b) or a percentage next to a solvent.`,
    );

  const columnVolumes = columnVolumesOf(slots);
  const inline = new Map<string, number>();
  const compositions: Composition[] = steps.map((step, stepIndex) => {
    const total = step.reduce((sum, parts) => sum + parts, 0);
    if (!(total > 0) || step.some((parts) => !(parts >= 0)))
      throw new NotationError('Parts and percentages must be zero or more, and not all zero.');
    names.forEach((slot, index) => {
      const name = nameOf(slot);
      if (name.role !== 'additive') return;
      const percent = (100 * step[index]) / total;
      if (inline.has(name.key) && Math.abs((inline.get(name.key) as number) - percent) > 1e-9) {
        throw new NotationError(
          `Write the amount of ${label(name)} once, e.g. "+ 1% ${label(name)}", not as part of a changing ratio.`,
        );
      }
      inline.set(name.key, percent);
    });
    const components = names
      .map((slot, index) => ({ name: nameOf(slot), parts: step[index] }))
      .filter(({ name, parts }) => name.role === 'solvent' && parts > 0)
      .map(({ name, parts }) => ({ solvent: name.key, parts }));
    if (components.length === 0) throw new NotationError('A step of the eluent holds no solvent.');
    return { components, columnVolumes: stepIndex === steps.length - 1 ? columnVolumes : null };
  });
  for (const [additive, percent] of inline) {
    if (!(percent > 0 && percent <= 20))
      throw new NotationError(`${additive} at ${Math.round(percent * 100) / 100}% is outside 0–20% v/v.`);
    additives.push({ additive, percent });
  }
  return { steps: compositions, additives };
}
