/**
 * Ratios chemists write for a two-solvent eluent, as strong : weak parts (common practice: round numbers such as
 * 1 : 9, 1 : 4, 1 : 1), from 1 % to pure strong solvent. The suggestion is rounded to one of these.
 */
const ratioLadder: readonly (readonly [number, number])[] = [
  [1, 99],
  [1, 49],
  [1, 29],
  [1, 19],
  [1, 14],
  [1, 9],
  [1, 7],
  [1, 5],
  [1, 4],
  [1, 3],
  [3, 7],
  [1, 2],
  [2, 3],
  [1, 1],
  [3, 2],
  [2, 1],
  [3, 1],
  [4, 1],
  [9, 1],
];

export interface LadderStep {
  /** Parts of strong and weak solvent; [1, 0] for the pure strong solvent, [0, 1] for the pure weak one. */
  parts: [number, number];
  strongFraction: number;
}

/** Every ladder step plus the two pure solvents, weakest first. */
export function ladderSteps(): LadderStep[] {
  return [
    { parts: [0, 1], strongFraction: 0 },
    ...ratioLadder.map(([strong, weak]) => ({
      parts: [strong, weak] as [number, number],
      strongFraction: strong / (strong + weak),
    })),
    { parts: [1, 0], strongFraction: 1 },
  ];
}
