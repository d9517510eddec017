import { applyHomography, homographyFrom, type Homography, type Point } from './geometry';
import { boxBlur, floatMap, median, type FloatMap } from './raster';
import type { RgbImage } from './segment';

/** A plate straightened into its own rectangle: its pixels, and the homography from it back to the photo. */
/** `scale`: frame pixels per photo pixel (above 1 for narrow plates sampled finer). */
export type PlateFrame = { width: number; height: number; rgb: Float32Array; toPhoto: Homography; scale: number };

const MAX_FRAME_PIXELS = 700_000;
const MIN_FRAME_WIDTH = 240;

/**
 * Undoes rotation and perspective: samples the photo (bilinear) on the plate's own rectangle through the homography
 * that takes the rectangle's corners to the plate's corners. Narrow plates are sampled finer, so the filters below
 * can work at one scale; large ones coarser, to bound the time.
 */
export function straighten(image: RgbImage, corners: Point[]): PlateFrame | null {
  const side = (a: Point, b: Point) => Math.hypot(b[0] - a[0], b[1] - a[1]);
  const plateWidth = (side(corners[0], corners[1]) + side(corners[3], corners[2])) / 2;
  const plateHeight = (side(corners[0], corners[3]) + side(corners[1], corners[2])) / 2;
  let scale = Math.max(1, MIN_FRAME_WIDTH / plateWidth);
  if (plateWidth * plateHeight * scale * scale > MAX_FRAME_PIXELS)
    scale = Math.sqrt(MAX_FRAME_PIXELS / (plateWidth * plateHeight));
  const width = Math.max(8, Math.round(plateWidth * scale));
  const height = Math.max(8, Math.round(plateHeight * scale));
  const toPhoto = homographyFrom(
    [
      [0, 0],
      [width, 0],
      [width, height],
      [0, height],
    ],
    corners,
  );
  if (!toPhoto) return null;
  const rgb = new Float32Array(width * height * 3);
  const { data } = image;
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      const [px, py] = applyHomography(toPhoto, [x + 0.5, y + 0.5]);
      const fx = Math.min(image.width - 1.001, Math.max(0, px - 0.5));
      const fy = Math.min(image.height - 1.001, Math.max(0, py - 0.5));
      const x0 = Math.floor(fx),
        y0 = Math.floor(fy),
        tx = fx - x0,
        ty = fy - y0;
      const a = (y0 * image.width + x0) * 3,
        b = a + 3,
        c = a + image.width * 3,
        d = c + 3;
      const out = (y * width + x) * 3;
      for (let k = 0; k < 3; k++) {
        rgb[out + k] =
          (data[a + k] * (1 - tx) + data[b + k] * tx) * (1 - ty) + (data[c + k] * (1 - tx) + data[d + k] * tx) * ty;
      }
    }
  }
  return { width, height, rgb, toPhoto, scale: width / plateWidth };
}

/**
 * The plate's background colour at every pixel: per-channel medians of blocks about a quarter of the plate's short
 * side (spots cover less than half a block), a 3×3 median across blocks, then bilinear interpolation between
 * block centres. A flat-field estimate of the kind common in image analysis (common practice; the idea is that of
 * Sternberg's rolling-ball background, IEEE Computer 1983, from memory), robust to spots by the medians.
 */
function background(frame: PlateFrame): Float32Array {
  const { width, height, rgb } = frame;
  const block = Math.max(10, Math.min(80, Math.round(Math.min(width, height) / 4)));
  const nx = Math.max(1, Math.round(width / block)),
    ny = Math.max(1, Math.round(height / block));
  const grid = new Float32Array(nx * ny * 3);
  const values: number[][] = [[], [], []];
  for (let by = 0; by < ny; by++) {
    for (let bx = 0; bx < nx; bx++) {
      values.forEach((list) => (list.length = 0));
      const x0 = Math.floor((bx * width) / nx),
        x1 = Math.floor(((bx + 1) * width) / nx);
      const y0 = Math.floor((by * height) / ny),
        y1 = Math.floor(((by + 1) * height) / ny);
      for (let y = y0; y < y1; y += 2)
        for (let x = x0; x < x1; x += 2) for (let c = 0; c < 3; c++) values[c].push(rgb[(y * width + x) * 3 + c]);
      for (let c = 0; c < 3; c++) grid[(by * nx + bx) * 3 + c] = median(values[c]);
    }
  }
  const smoothed = new Float32Array(grid.length);
  for (let by = 0; by < ny; by++) {
    for (let bx = 0; bx < nx; bx++) {
      for (let c = 0; c < 3; c++) {
        const around: number[] = [];
        for (let dy = -1; dy <= 1; dy++)
          for (let dx = -1; dx <= 1; dx++) {
            const gx = bx + dx,
              gy = by + dy;
            if (gx >= 0 && gx < nx && gy >= 0 && gy < ny) around.push(grid[(gy * nx + gx) * 3 + c]);
          }
        smoothed[(by * nx + bx) * 3 + c] = median(around);
      }
    }
  }
  const out = new Float32Array(width * height * 3);
  for (let y = 0; y < height; y++) {
    const gy = Math.min(ny - 1, Math.max(0, ((y + 0.5) * ny) / height - 0.5));
    const y0 = Math.floor(gy),
      y1 = Math.min(ny - 1, y0 + 1),
      ty = gy - y0;
    for (let x = 0; x < width; x++) {
      const gx = Math.min(nx - 1, Math.max(0, ((x + 0.5) * nx) / width - 0.5));
      const x0 = Math.floor(gx),
        x1 = Math.min(nx - 1, x0 + 1),
        tx = gx - x0;
      for (let c = 0; c < 3; c++) {
        const top = smoothed[(y0 * nx + x0) * 3 + c] * (1 - tx) + smoothed[(y0 * nx + x1) * 3 + c] * tx;
        const bottom = smoothed[(y1 * nx + x0) * 3 + c] * (1 - tx) + smoothed[(y1 * nx + x1) * 3 + c] * tx;
        out[(y * width + x) * 3 + c] = top * (1 - ty) + bottom * ty;
      }
    }
  }
  return out;
}

/**
 * How much each pixel departs from the plate's background: the colour difference scaled to a standard background
 * brightness (so shade and uneven light divide out), with any brightening toward white removed (glare adds white;
 * a stain's pale spot on a dark ground still differs in hue). Lightly blurred against JPEG noise.
 */
export function departure(frame: PlateFrame): FloatMap {
  const { width, height, rgb } = frame;
  const ground = background(frame);
  const map = floatMap(width, height);
  for (let i = 0; i < width * height; i++) {
    const r = ground[i * 3],
      g = ground[i * 3 + 1],
      b = ground[i * 3 + 2];
    const scale = 180 / Math.max(30, 0.299 * r + 0.587 * g + 0.114 * b);
    let er = (rgb[i * 3] - r) * scale,
      eg = (rgb[i * 3 + 1] - g) * scale,
      eb = (rgb[i * 3 + 2] - b) * scale;
    const wr = 255 - r,
      wg = 255 - g,
      wb = 255 - b;
    const norm = Math.hypot(wr, wg, wb) || 1;
    const toward = (er * wr + eg * wg + eb * wb) / norm;
    if (toward > 0) {
      er -= (toward * wr) / norm;
      eg -= (toward * wg) / norm;
      eb -= (toward * wb) / norm;
    }
    map.data[i] = Math.sqrt(er * er + eg * eg + eb * eb);
  }
  return boxBlur(boxBlur(map, 1), 1);
}
