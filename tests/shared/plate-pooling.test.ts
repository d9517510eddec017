import { describe, expect, it } from 'vitest';
import { proposePooling } from '../../shared/domain/plate-pooling';

describe('proposePooling', () => {
  it('when fractions 5–9 hold the target alone and 10–11 also a second spot, then "combine 5–9; 10–11 mixed"', () => {
    const lanes = Array.from({ length: 12 }, (_, i) => {
      const fraction = i + 1;
      const rfs = [
        ...(fraction >= 5 && fraction <= 11 ? [0.3 + (fraction % 2) * 0.01] : []),
        ...(fraction >= 10 ? [0.45] : []),
      ];
      return { fraction, rfs };
    });
    const out = proposePooling(lanes, 0.3);
    expect(out.summary).toBe('combine 5–9; 10–11 mixed');
    expect(out.pure).toEqual([[5, 9]]);
    expect(out.mixed).toEqual([[10, 11]]);
    expect(out.fractions.find((f) => f.fraction === 12)?.state).toBe('other');
    expect(out.fractions.find((f) => f.fraction === 1)?.state).toBe('empty');
  });

  it('when the clean fractions are interrupted by a mixed one, then two runs are proposed', () => {
    const out = proposePooling(
      [
        { fraction: 3, rfs: [0.5] },
        { fraction: 4, rfs: [0.5, 0.2] },
        { fraction: 5, rfs: [0.51] },
        { fraction: 6, rfs: [0.49] },
      ],
      0.5,
    );
    expect(out.summary).toBe('combine 3, 5–6; 4 mixed');
  });

  it('when no fraction holds the target, then it says so', () => {
    expect(
      proposePooling(
        [
          { fraction: 1, rfs: [] },
          { fraction: 2, rfs: [0.8] },
        ],
        0.3,
      ).summary,
    ).toBe('no fraction holds the target alone');
  });
});
