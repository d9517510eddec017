import { describe, expect, it } from 'vitest';
import { rfBetweenLines } from '../../shared/domain/plate-rf';

describe('rfBetweenLines', () => {
  it('when the spot is 30 mm above the origin and the front 60 mm, then Rf 0.5 (Rf = spot distance / front distance, IUPAC)', () => {
    expect(
      rfBetweenLines(
        [50, 70],
        [
          [0, 100],
          [100, 100],
        ],
        [
          [0, 40],
          [100, 40],
        ],
      ),
    ).toBeCloseTo(0.5, 10);
  });

  it('when the whole plate is turned 7°, then the Rf is unchanged', () => {
    const angle = (7 * Math.PI) / 180;
    const turn = ([x, y]: [number, number]): [number, number] => [
      x * Math.cos(angle) - y * Math.sin(angle),
      x * Math.sin(angle) + y * Math.cos(angle),
    ];
    const rf = rfBetweenLines(turn([30, 82]), [turn([0, 100]), turn([100, 100])], [turn([0, 40]), turn([100, 40])]);
    expect(rf).toBeCloseTo(0.3, 10);
  });

  it('when origin and front coincide, then no Rf', () => {
    expect(
      rfBetweenLines(
        [1, 1],
        [
          [0, 0],
          [10, 0],
        ],
        [
          [0, 0],
          [10, 0],
        ],
      ),
    ).toBeNull();
  });
});
