import { convexHull, minAreaRectangleAngle, polygonArea, quadCorners, type Point } from './geometry';
import { boxBlur, components, fillHoles, floatMap, median, morph, otsuThreshold, type Mask } from './raster';

/** An RGB image, 3 bytes a pixel, row by row. */
export type RgbImage = { width: number; height: number; data: Uint8Array | Buffer };

export type FoundPlate = { corners: Point[]; area: number; fill: number };

/**
 * Finds the plates in a (small) photo: each pixel's colour distance from the bench, estimated as the median colour
 * of the photo's outer ring, is split into plate and bench by Otsu's threshold; holes (dark spots) are filled, thin
 * bridges opened, and every large, nearly rectangular blob that does not touch the photo's edge is a plate, its
 * corners taken from the convex hull in the frame of the minimum-area rectangle. Plates come back left to right.
 */
export function findPlates(image: RgbImage): FoundPlate[] {
  const { width, height, data } = image;
  const ring = Math.max(2, Math.round(Math.min(width, height) * 0.02));
  const border: number[][] = [[], [], []];
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      if (x >= ring && x < width - ring && y >= ring && y < height - ring) continue;
      const at = (y * width + x) * 3;
      for (let c = 0; c < 3; c++) border[c].push(data[at + c]);
    }
  }
  const bench = border.map((values) => median(values));
  const distance = floatMap(width, height);
  for (let i = 0; i < width * height; i++) {
    const r = data[i * 3] - bench[0], g = data[i * 3 + 1] - bench[1], b = data[i * 3 + 2] - bench[2];
    distance.data[i] = Math.sqrt(r * r + g * g + b * b);
  }
  const smooth = boxBlur(boxBlur(distance, 1), 1);
  const threshold = Math.max(otsuThreshold(smooth.data), 12);
  const mask: Mask = { width, height, data: new Uint8Array(width * height) };
  for (let i = 0; i < mask.data.length; i++) mask.data[i] = smooth.data[i] > threshold ? 1 : 0;
  const opened = morph(morph(fillHoles(mask), 1, false), 1, true);
  const minArea = Math.max(120, width * height * 0.002);
  const plates: FoundPlate[] = [];
  for (const blob of components(opened, minArea)) {
    if (blob.minX === 0 || blob.minY === 0 || blob.maxX === width - 1 || blob.maxY === height - 1) continue;
    const edge: Point[] = [];
    for (const i of blob.pixels) {
      const x = i % width, y = (i - x) / width;
      const inside = opened.data[i - 1] && opened.data[i + 1] && opened.data[i - width] && opened.data[i + width];
      if (!inside) edge.push([x + 0.5, y + 0.5]);
    }
    const hull = convexHull(edge);
    if (hull.length < 4) continue;
    const { angle } = minAreaRectangleAngle(hull);
    const corners = quadCorners(hull, angle);
    const quadArea = polygonArea(corners);
    const fill = blob.area / quadArea;
    if (fill < 0.8 || fill > 1.2) continue;
    const sideA = Math.hypot(corners[1][0] - corners[0][0], corners[1][1] - corners[0][1]);
    const sideB = Math.hypot(corners[3][0] - corners[0][0], corners[3][1] - corners[0][1]);
    if (Math.min(sideA, sideB) < 8) continue;
    plates.push({ corners, area: blob.area, fill });
  }
  return plates.sort((a, b) => a.corners[0][0] + a.corners[3][0] - b.corners[0][0] - b.corners[3][0]);
}
