/**
 * Small raster operations on single-channel maps: box blur (repeated, it approaches a Gaussian), Otsu's threshold
 * (Otsu, IEEE Trans. Syst. Man Cybern. 1979), binary morphology, hole filling by flood fill from the border, and
 * connected components by breadth-first labelling (Rosenfeld & Pfaltz, J. ACM 1966).
 */
export type FloatMap = { width: number; height: number; data: Float32Array };
export type Mask = { width: number; height: number; data: Uint8Array };

export function floatMap(width: number, height: number): FloatMap {
  return { width, height, data: new Float32Array(width * height) };
}

/** Box blur of radius r (window 2r+1) along both axes, with edge clamping; running sums keep it O(pixels). */
export function boxBlur(map: FloatMap, radius: number): FloatMap {
  if (radius < 1) return map;
  const { width, height } = map;
  const pass = (src: Float32Array, dst: Float32Array, length: number, lines: number, step: number, stride: number) => {
    const window = 2 * radius + 1;
    for (let line = 0; line < lines; line++) {
      const base = line * stride;
      let sum = 0;
      for (let k = -radius; k <= radius; k++) sum += src[base + Math.min(length - 1, Math.max(0, k)) * step];
      for (let i = 0; i < length; i++) {
        dst[base + i * step] = sum / window;
        sum += src[base + Math.min(length - 1, i + radius + 1) * step] - src[base + Math.max(0, i - radius) * step];
      }
    }
  };
  const tmp = new Float32Array(width * height);
  const out = new Float32Array(width * height);
  pass(map.data, tmp, width, height, 1, width);
  pass(tmp, out, height, width, width, 1);
  return { width, height, data: out };
}

/** Otsu's threshold on the values of a map (256 bins between its minimum and maximum). */
export function otsuThreshold(values: Float32Array): number {
  let min = Infinity,
    max = -Infinity;
  for (const value of values) {
    if (value < min) min = value;
    if (value > max) max = value;
  }
  if (!(max > min)) return max;
  const bins = new Float64Array(256);
  const scale = 255 / (max - min);
  for (const value of values) bins[Math.round((value - min) * scale)]++;
  let total = 0,
    sumAll = 0;
  for (let i = 0; i < 256; i++) {
    total += bins[i];
    sumAll += i * bins[i];
  }
  let weightLow = 0,
    sumLow = 0,
    best = 0,
    bestVariance = -1;
  for (let i = 0; i < 256; i++) {
    weightLow += bins[i];
    if (weightLow === 0 || weightLow === total) continue;
    sumLow += i * bins[i];
    const meanLow = sumLow / weightLow,
      meanHigh = (sumAll - sumLow) / (total - weightLow);
    const variance = weightLow * (total - weightLow) * (meanLow - meanHigh) ** 2;
    if (variance > bestVariance) {
      bestVariance = variance;
      best = i;
    }
  }
  return min + (best + 0.5) / scale;
}

/** Binary dilation (grow = true) or erosion with a (2r+1)² square. */
export function morph(mask: Mask, radius: number, grow: boolean): Mask {
  const { width, height } = mask;
  const horizontal = new Uint8Array(width * height);
  const out = new Uint8Array(width * height);
  const hit = grow ? 1 : 0;
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      let value = 1 - hit;
      for (let k = Math.max(0, x - radius); k <= Math.min(width - 1, x + radius); k++)
        if (mask.data[y * width + k] === hit) {
          value = hit;
          break;
        }
      horizontal[y * width + x] = value;
    }
  }
  for (let x = 0; x < width; x++) {
    for (let y = 0; y < height; y++) {
      let value = 1 - hit;
      for (let k = Math.max(0, y - radius); k <= Math.min(height - 1, y + radius); k++)
        if (horizontal[k * width + x] === hit) {
          value = hit;
          break;
        }
      out[y * width + x] = value;
    }
  }
  return { width, height, data: out };
}

/** Sets every 0-pixel not connected (4-neighbours) to the map's border to 1: closed outlines become filled shapes. */
export function fillHoles(mask: Mask): Mask {
  const { width, height } = mask;
  const outside = new Uint8Array(width * height);
  const queue = new Int32Array(width * height);
  let head = 0,
    tail = 0;
  const seed = (i: number) => {
    if (!mask.data[i] && !outside[i]) {
      outside[i] = 1;
      queue[tail++] = i;
    }
  };
  for (let x = 0; x < width; x++) {
    seed(x);
    seed((height - 1) * width + x);
  }
  for (let y = 0; y < height; y++) {
    seed(y * width);
    seed(y * width + width - 1);
  }
  while (head < tail) {
    const i = queue[head++];
    const x = i % width;
    if (x > 0) seed(i - 1);
    if (x < width - 1) seed(i + 1);
    if (i >= width) seed(i - width);
    if (i < width * (height - 1)) seed(i + width);
  }
  const out = new Uint8Array(width * height);
  for (let i = 0; i < out.length; i++) out[i] = outside[i] ? 0 : 1;
  return { width, height, data: out };
}

export type Component = {
  label: number;
  area: number;
  minX: number;
  maxX: number;
  minY: number;
  maxY: number;
  pixels: Int32Array;
};

/** Connected components (4-neighbours) of a mask, each with its pixel indices and bounding box. */
export function components(mask: Mask, minArea = 1): Component[] {
  const { width, height } = mask;
  const labels = new Int32Array(width * height);
  const queue = new Int32Array(width * height);
  const found: Component[] = [];
  let next = 0;
  for (let start = 0; start < labels.length; start++) {
    if (!mask.data[start] || labels[start]) continue;
    next++;
    let head = 0,
      tail = 0;
    queue[tail++] = start;
    labels[start] = next;
    let minX = width,
      maxX = 0,
      minY = height,
      maxY = 0;
    while (head < tail) {
      const i = queue[head++];
      const x = i % width,
        y = (i - x) / width;
      if (x < minX) minX = x;
      if (x > maxX) maxX = x;
      if (y < minY) minY = y;
      if (y > maxY) maxY = y;
      const visit = (j: number) => {
        if (mask.data[j] && !labels[j]) {
          labels[j] = next;
          queue[tail++] = j;
        }
      };
      if (x > 0) visit(i - 1);
      if (x < width - 1) visit(i + 1);
      if (y > 0) visit(i - width);
      if (y < height - 1) visit(i + width);
    }
    if (tail >= minArea) found.push({ label: next, area: tail, minX, maxX, minY, maxY, pixels: queue.slice(0, tail) });
  }
  return found;
}

/** Median of an array of numbers (copy sorted). */
export function median(values: ArrayLike<number>): number {
  if (values.length === 0) return 0;
  const sorted = Float64Array.from(values).sort();
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

/** Local maxima of a 1-D profile with their topographic prominence, highest first. */
export function peaks(profile: ArrayLike<number>): { index: number; value: number; prominence: number }[] {
  const found: { index: number; value: number; prominence: number }[] = [];
  const n = profile.length;
  for (let i = 0; i < n; i++) {
    const value = profile[i];
    if ((i > 0 && profile[i - 1] >= value) || (i < n - 1 && profile[i + 1] > value)) continue;
    let leftMin = value,
      rightMin = value;
    let j = i - 1;
    for (; j >= 0 && profile[j] <= value; j--) leftMin = Math.min(leftMin, profile[j]);
    let k = i + 1;
    for (; k < n && profile[k] <= value; k++) rightMin = Math.min(rightMin, profile[k]);
    found.push({ index: i, value, prominence: value - Math.max(leftMin, rightMin) });
  }
  return found.sort((a, b) => b.prominence - a.prominence);
}
