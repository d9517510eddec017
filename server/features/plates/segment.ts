import { convexHull, minAreaRectangleAngle, polygonArea, quadCorners, type Point } from './geometry';
import {
  boxBlur,
  components,
  fillHoles,
  floatMap,
  median,
  morph,
  otsuThreshold,
  type FloatMap,
  type Mask,
} from './raster';

/** An RGB image, 3 bytes a pixel, row by row. */
export type RgbImage = { width: number; height: number; data: Uint8Array | Buffer };

export type FoundPlate = { corners: Point[]; area: number; fill: number };

/**
 * Finds the plates in a (small) photo: each pixel's colour distance from the bench, estimated as the median colour
 * of the photo's outer ring (or, when that finds nothing, how much smoother than the rim it is), is split into plate
 * and bench by Otsu's threshold; holes (dark spots) are filled, thin
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
    const r = data[i * 3] - bench[0],
      g = data[i * 3 + 1] - bench[1],
      b = data[i * 3 + 2] - bench[2];
    distance.data[i] = Math.sqrt(r * r + g * g + b * b);
  }
  const byColour = platesIn(boxBlur(boxBlur(distance, 1), 1), 12);
  return byColour.length > 0 ? byColour : platesIn(smoothness(image, ring), 1.5);
}

/**
 * How much smoother each pixel's neighbourhood is than the photo's rim (local standard deviation of brightness):
 * silica is smooth, a paper towel or a bench is textured, so a white plate on a white towel stands out here when
 * its colour does not.
 */
function smoothness(image: RgbImage, ring: number): FloatMap {
  const { width, height, data } = image;
  const luma = floatMap(width, height),
    square = floatMap(width, height);
  for (let i = 0; i < width * height; i++) {
    luma.data[i] = 0.299 * data[i * 3] + 0.587 * data[i * 3 + 1] + 0.114 * data[i * 3 + 2];
    square.data[i] = luma.data[i] ** 2;
  }
  const mean = boxBlur(luma, 2),
    meanSquare = boxBlur(square, 2);
  const texture = floatMap(width, height);
  for (let i = 0; i < width * height; i++)
    texture.data[i] = Math.sqrt(Math.max(0, meanSquare.data[i] - mean.data[i] ** 2));
  const rim: number[] = [];
  for (let y = 0; y < height; y++)
    for (let x = 0; x < width; x++) {
      if (x < ring || y < ring || x >= width - ring || y >= height - ring) rim.push(texture.data[y * width + x]);
    }
  const rimTexture = median(rim);
  const smooth = boxBlur(boxBlur(texture, 3), 3);
  for (let i = 0; i < width * height; i++) smooth.data[i] = Math.max(0, rimTexture - smooth.data[i]);
  return smooth;
}

/**
 * Plates in a map where plates score high and the bench low, at Otsu's threshold and at Otsu's thresholds of the
 * classes below and above it (a shadowed bench or a lit plate can make a third class). Where candidates of several
 * thresholds overlap, the most rectangular, then the largest, is kept.
 */
function platesIn(smooth: FloatMap, floor: number): FoundPlate[] {
  const first = otsuThreshold(smooth.data);
  const candidates = [first].filter((t) => Number.isFinite(t) && t >= floor).flatMap((t) => platesAt(smooth, t));
  const score = (plate: FoundPlate) => plate.area * (1 - 3 * Math.abs(1 - plate.fill));
  candidates.sort((a, b) => score(b) - score(a));
  const kept: FoundPlate[] = [];
  for (const candidate of candidates) {
    const [cx, cy] = centreOf(candidate.corners);
    if (
      kept.some(
        (plate) => insideQuad(plate.corners, cx, cy) || insideQuad(candidate.corners, ...centreOf(plate.corners)),
      )
    )
      continue;
    kept.push(candidate);
  }
  return kept.sort((a, b) => a.corners[0][0] + a.corners[3][0] - b.corners[0][0] - b.corners[3][0]);
}

const centreOf = (corners: Point[]): [number, number] => [
  corners.reduce((s, p) => s + p[0], 0) / 4,
  corners.reduce((s, p) => s + p[1], 0) / 4,
];

function insideQuad(corners: Point[], x: number, y: number): boolean {
  let sign = 0;
  for (let i = 0; i < 4; i++) {
    const [x0, y0] = corners[i],
      [x1, y1] = corners[(i + 1) % 4];
    const cross = Math.sign((x1 - x0) * (y - y0) - (y1 - y0) * (x - x0));
    if (cross !== 0 && sign !== 0 && cross !== sign) return false;
    if (cross !== 0) sign = cross;
  }
  return true;
}

function platesAt(smooth: FloatMap, threshold: number): FoundPlate[] {
  const { width, height } = smooth;
  const mask: Mask = { width, height, data: new Uint8Array(width * height) };
  for (let i = 0; i < mask.data.length; i++) mask.data[i] = smooth.data[i] > threshold ? 1 : 0;
  const closed = fillHoles(morph(morph(mask, 2, true), 2, false));
  const opened = morph(morph(closed, 1, false), 1, true);
  const minArea = Math.max(120, width * height * 0.002);
  const plates: FoundPlate[] = [];
  for (const blob of components(opened, minArea)) {
    if (blob.minX === 0 || blob.minY === 0 || blob.maxX === width - 1 || blob.maxY === height - 1) continue;
    const edge: Point[] = [];
    for (const i of blob.pixels) {
      const x = i % width,
        y = (i - x) / width;
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
  return plates;
}
