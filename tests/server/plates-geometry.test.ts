import { describe, expect, it } from 'vitest';
import {
  applyHomography,
  convexHull,
  homographyFrom,
  minAreaRectangleAngle,
  polygonArea,
  quadCorners,
  type Point,
} from '../../server/features/plates/geometry';
import { otsuThreshold, peaks } from '../../server/features/plates/raster';
import { imageToPlate, makePhotoScene, plateToImage } from '../bench/plates-scene';

describe('plate geometry', () => {
  it(
    'when a homography is solved from four corners, then it maps those corners and keeps straight ' +
      'lines straight (projective map, Hartley & Zisserman 2004 §4.1)',
    () => {
      const rectangle: Point[] = [
        [0, 0],
        [200, 0],
        [200, 600],
        [0, 600],
      ];
      const quad: Point[] = [
        [103, 52],
        [311, 61],
        [322, 668],
        [96, 655],
      ];
      const h = homographyFrom(rectangle, quad)!;
      rectangle.forEach((corner, i) => {
        const [x, y] = applyHomography(h, corner);
        expect(x).toBeCloseTo(quad[i][0], 6);
        expect(y).toBeCloseTo(quad[i][1], 6);
      });
      const [a, b, c] = [applyHomography(h, [0, 300]), applyHomography(h, [100, 300]), applyHomography(h, [200, 300])];
      const cross = (b[0] - a[0]) * (c[1] - a[1]) - (b[1] - a[1]) * (c[0] - a[0]);
      expect(Math.abs(cross)).toBeLessThan(1e-6);
    },
  );

  it('when four corners are collinear, then no homography is offered', () => {
    expect(
      homographyFrom(
        [
          [0, 0],
          [1, 0],
          [2, 0],
          [3, 0],
        ],
        [
          [0, 0],
          [1, 1],
          [2, 2],
          [3, 3],
        ],
      ),
    ).toBeNull();
  });

  it(
    "when the generator places a plate, then the reader's homography through its corners agrees with " +
      "the generator's own projective map to 0.01 px",
    () => {
      const scene = makePhotoScene(42);
      const plate = scene.plates[0];
      const corners = [
        [0, 0],
        [plate.widthMm, 0],
        [plate.widthMm, plate.heightMm],
        [0, plate.heightMm],
      ] as Point[];
      const h = homographyFrom(
        corners,
        corners.map(([u, v]) => plateToImage(scene, plate, u, v)),
      )!;
      for (const [u, v] of [
        [plate.widthMm / 3, plate.heightMm / 5],
        [plate.widthMm * 0.8, plate.heightMm * 0.9],
      ]) {
        const [x, y] = applyHomography(h, [u, v]);
        const [ex, ey] = plateToImage(scene, plate, u, v);
        expect(Math.hypot(x - ex, y - ey)).toBeLessThan(0.01);
        const [bu, bv] = imageToPlate(scene, plate, ex, ey);
        expect(Math.hypot(bu - u, bv - v)).toBeLessThan(1e-6);
      }
    },
  );

  it('when a rectangle turned by 5° is hulled, then the minimum-area rectangle has its angle and the corners come back in order', () => {
    const angle = (5 * Math.PI) / 180;
    const turn = ([x, y]: Point): Point => [
      100 + x * Math.cos(angle) - y * Math.sin(angle),
      80 + x * Math.sin(angle) + y * Math.cos(angle),
    ];
    const rectangle = (
      [
        [0, 0],
        [60, 0],
        [60, 200],
        [0, 200],
      ] as Point[]
    ).map(turn);
    const inside: Point[] = [];
    for (let x = 0; x <= 60; x += 5) for (let y = 0; y <= 200; y += 10) inside.push(turn([x, y]));
    const hull = convexHull(inside);
    expect(polygonArea(hull)).toBeCloseTo(60 * 200, 3);
    const found = minAreaRectangleAngle(hull);
    expect(found.angle).toBeCloseTo(angle, 6);
    expect(found.area).toBeCloseTo(60 * 200, 3);
    quadCorners(hull, found.angle).forEach((corner, i) => {
      expect(corner[0]).toBeCloseTo(rectangle[i][0], 6);
      expect(corner[1]).toBeCloseTo(rectangle[i][1], 6);
    });
  });

  it("when values form two groups, then Otsu's threshold falls between them (Otsu 1979)", () => {
    const values = Float32Array.from([
      ...Array(300)
        .fill(0)
        .map((_, i) => 20 + (i % 7)),
      ...Array(100)
        .fill(0)
        .map((_, i) => 200 + (i % 9)),
    ]);
    const threshold = otsuThreshold(values);
    expect(threshold).toBeGreaterThan(26);
    expect(threshold).toBeLessThan(200);
  });

  it('when a profile has a tall and a small peak, then both are found, the tall one first by prominence', () => {
    const found = peaks([0, 1, 5, 1, 0, 0, 2, 3, 2, 0]);
    expect(found.map((peak) => [peak.index, peak.prominence])).toEqual([
      [2, 5],
      [7, 3],
    ]);
  });
});
