/**
 * Invented TLC plate scenes with known geometry, for the plate reader's benchmark and tests. A scene is drawn in
 * millimetres on each plate (u to the right, v down from the plate's top edge) and placed in the photo by a
 * rotation, a scale and a slight projective tilt. Everything here is made up by the generator: no real photo,
 * compound or record is behind it.
 */

export const PLATE_LOOKS = ['uv254', 'pencil', 'kmno4', 'pma', 'ceric', 'anisaldehyde', 'vanillin', 'iodine'] as const;
export type PlateLook = (typeof PLATE_LOOKS)[number];

export type SpotTruth = {
  u: number;
  v: number;
  rf: number;
  radius: number;
  kind: 'spot' | 'circle' | 'streak';
  rfLow?: number;
  rfHigh?: number;
  colour: [number, number, number];
  strength: number;
  circled: boolean;
};
export type LaneTruth = { u: number; label: string; spots: SpotTruth[] };
export type PlateScene = {
  widthMm: number;
  heightMm: number;
  originV: number;
  frontV: number;
  frontStyle: 'line' | 'ticks';
  kind: 'single' | 'monitor' | 'multi' | 'fractions';
  lanes: LaneTruth[];
  /** Placement: centre in image px, px per mm, rotation (rad). */
  cx: number;
  cy: number;
  scale: number;
  angle: number;
};
export type PhotoScene = {
  seed: number;
  look: PlateLook;
  width: number;
  height: number;
  background: 'bench' | 'uv-floor' | 'towel';
  /** Projective tilt about the image centre: x' = x / (1 + tiltX·x + tiltY·y), image px relative to the centre. */
  tiltX: number;
  tiltY: number;
  plates: PlateScene[];
  glare: { x: number; y: number; sx: number; sy: number; amount: number } | null;
  shadow: { nx: number; ny: number; offset: number; soft: number; depth: number } | null;
  light: { gx: number; gy: number };
  noise: number;
  format: 'jpeg' | 'png' | 'webp';
  quality: number;
  /** EXIF orientation stored in the file (1 = as displayed). */
  orientation: 1 | 3 | 6 | 8;
};

/** Small seeded generator (mulberry32), so a seed always draws the same photo. */
export function seededRandom(seed: number): () => number {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

const PLATE_COLOUR: Record<PlateLook, [number, number, number]> = {
  uv254: [112, 214, 122],
  pencil: [236, 236, 230],
  kmno4: [168, 82, 150],
  pma: [224, 228, 172],
  ceric: [212, 224, 198],
  anisaldehyde: [242, 214, 222],
  vanillin: [238, 220, 214],
  iodine: [240, 232, 206],
};
const MULTI: [number, number, number][] = [
  [120, 50, 130],
  [60, 80, 150],
  [170, 50, 60],
  [70, 120, 80],
  [140, 90, 50],
  [200, 110, 40],
];

export function plateColour(look: PlateLook): [number, number, number] {
  return PLATE_COLOUR[look];
}

function spotColour(look: PlateLook, rnd: () => number): [number, number, number] {
  switch (look) {
    case 'uv254':
      return [60, 55, 85];
    case 'pencil':
      return [236, 236, 230];
    case 'kmno4':
      return [222, 190, 92];
    case 'pma':
      return [45, 82, 92];
    case 'ceric':
      return [32, 62, 112];
    case 'iodine':
      return [172, 118, 48];
    default:
      return MULTI[Math.floor(rnd() * MULTI.length)];
  }
}

function pick<T>(rnd: () => number, items: readonly T[]): T {
  return items[Math.floor(rnd() * items.length)];
}
const between = (rnd: () => number, low: number, high: number) => low + (high - low) * rnd();

/** Rf values in (low, high) at least `gap` apart. */
function spacedRfs(rnd: () => number, count: number, low: number, high: number, gap: number): number[] {
  for (let attempt = 0; attempt < 200; attempt++) {
    const values = Array.from({ length: count }, () => between(rnd, low, high)).sort((a, b) => a - b);
    if (values.every((value, i) => i === 0 || value - values[i - 1] >= gap)) return values;
  }
  return Array.from({ length: count }, (_, i) => low + ((i + 0.5) * (high - low)) / count);
}

function makeSpot(
  rnd: () => number,
  look: PlateLook,
  rf: number,
  scene: Omit<PlateScene, 'lanes' | 'cx' | 'cy' | 'scale' | 'angle'>,
  u: number,
  radius: number,
  circled: boolean,
): SpotTruth {
  const run = scene.originV - scene.frontV;
  const faint = look === 'iodine' ? between(rnd, 0.45, 0.8) : between(rnd, 0.6, 1);
  return {
    u,
    v: scene.originV - rf * run,
    rf,
    radius,
    kind: look === 'pencil' ? 'circle' : 'spot',
    colour: spotColour(look, rnd),
    strength: faint,
    circled,
  };
}

/** One plate's lanes and spots. */
function makePlate(
  rnd: () => number,
  look: PlateLook,
  kind: PlateScene['kind'],
): Omit<PlateScene, 'cx' | 'cy' | 'scale' | 'angle'> {
  const laneCount =
    kind === 'single'
      ? 1
      : kind === 'monitor'
        ? 3
        : kind === 'multi'
          ? 2 + Math.floor(rnd() * 4)
          : 8 + Math.floor(rnd() * 7);
  const pitch = kind === 'fractions' ? between(rnd, 5, 7) : between(rnd, 6, 9);
  const margin = between(rnd, 4.5, 6.5);
  const widthMm = kind === 'single' ? between(rnd, 9, 14) : 2 * margin + pitch * (laneCount - 1);
  const heightMm = between(rnd, 50, 80);
  const originV = heightMm - between(rnd, 8, 12);
  const frontV = between(rnd, 5, 9);
  const base = { widthMm, heightMm, originV, frontV, frontStyle: rnd() < 0.5 ? 'line' : 'ticks', kind } as const;
  const circled = look === 'pencil' || (look === 'uv254' && rnd() < 0.3);
  const radius = () => (kind === 'fractions' ? between(rnd, 0.9, 1.5) : between(rnd, 1.0, 2.0));
  const laneU = (i: number) => (laneCount === 1 ? widthMm / 2 : margin + i * pitch);
  const lanes: LaneTruth[] = [];
  if (kind === 'monitor') {
    const [sm, product] =
      rnd() < 0.5 ? spacedRfs(rnd, 2, 0.15, 0.8, 0.12) : spacedRfs(rnd, 2, 0.15, 0.8, 0.12).reverse();
    const smLeft = rnd() < 0.5;
    const r = radius();
    lanes.push({ u: laneU(0), label: 'SM', spots: [makeSpot(rnd, look, sm, base, laneU(0), r, circled)] });
    lanes.push({
      u: laneU(1),
      label: 'co',
      spots: [sm, product].sort((a, b) => a - b).map((rf) => makeSpot(rnd, look, rf, base, laneU(1), r, circled)),
    });
    const mixture = smLeft ? [sm, product] : [product];
    lanes.push({
      u: laneU(2),
      label: 'RM',
      spots: mixture.sort((a, b) => a - b).map((rf) => makeSpot(rnd, look, rf, base, laneU(2), r, circled)),
    });
  } else if (kind === 'fractions') {
    const [target, other] = spacedRfs(rnd, 2, 0.2, 0.75, 0.15);
    const start = 1 + Math.floor(rnd() * 3);
    const end = Math.min(laneCount - 1, start + 3 + Math.floor(rnd() * 5));
    const otherFrom = Math.max(start, end - 1 - Math.floor(rnd() * 3));
    for (let i = 0; i < laneCount; i++) {
      const rfs = [
        ...(i >= start && i <= end ? [target] : []),
        ...(i >= otherFrom && i <= end + 2 ? [other] : []),
      ].sort((a, b) => a - b);
      lanes.push({
        u: laneU(i),
        label: String(i + 1),
        spots: rfs.map((rf) => makeSpot(rnd, look, rf, base, laneU(i), radius(), circled)),
      });
    }
  } else {
    for (let i = 0; i < laneCount; i++) {
      const count = 1 + Math.floor(rnd() * 3);
      const spots = spacedRfs(rnd, count, 0.1, 0.9, 0.14).map((rf) =>
        makeSpot(rnd, look, rf, base, laneU(i), radius(), circled),
      );
      if (look !== 'pencil' && rnd() < 0.12 && count === 1) {
        const spot = spots[0];
        const low = Math.max(0.08, spot.rf - between(rnd, 0.1, 0.2));
        const high = Math.min(0.85, spot.rf + between(rnd, 0.02, 0.08));
        Object.assign(spot, {
          kind: 'streak',
          rfLow: low,
          rfHigh: high,
          rf: (low + high) / 2,
          v: base.originV - ((low + high) / 2) * (originV - frontV),
          circled: false,
        });
      }
      lanes.push({ u: laneU(i), label: String.fromCharCode(65 + i), spots });
    }
  }
  return { ...base, lanes };
}

/** A whole photo: look, background, 1–3 plates side by side, light, glare, shadow, noise, format and orientation. */
export function makePhotoScene(seed: number, forcedLook?: PlateLook): PhotoScene {
  const rnd = seededRandom(seed * 7919 + 17);
  const look = forcedLook ?? pick(rnd, PLATE_LOOKS);
  const background =
    look === 'uv254' ? pick(rnd, ['uv-floor', 'bench'] as const) : pick(rnd, ['bench', 'towel', 'bench'] as const);
  const count = rnd() < 0.5 ? 1 : rnd() < 0.7 ? 2 : 3;
  const kinds: PlateScene['kind'][] = [];
  for (let i = 0; i < count; i++)
    kinds.push(rnd() < 0.2 ? 'fractions' : pick(rnd, ['single', 'monitor', 'multi'] as const));
  if (count === 3)
    kinds.forEach((kind, i) => {
      if (kind === 'fractions') kinds[i] = 'multi';
    });
  const plates = kinds.map((kind) => makePlate(rnd, look, kind));
  const lowRes = rnd() < 0.2;
  const width = lowRes ? Math.round(between(rnd, 420, 640)) : Math.round(between(rnd, 900, 1400));
  const height = Math.round(width * between(rnd, 0.7, 0.85));
  const gapMm = between(rnd, 4, 12);
  const totalMm = plates.reduce((sum, plate) => sum + plate.widthMm, 0) + gapMm * (count - 1);
  const tallest = Math.max(...plates.map((plate) => plate.heightMm));
  let scale = Math.min((width * between(rnd, 0.45, 0.75)) / totalMm, (height * between(rnd, 0.6, 0.8)) / tallest);
  const smallest = Math.min(...plates.map((plate) => plate.widthMm));
  if (lowRes) scale = Math.min(scale, Math.max(60 / smallest, 2.2));
  const angle = (between(rnd, -6, 6) * Math.PI) / 180;
  let left = -totalMm / 2;
  const placed = plates.map((plate) => {
    const centreU = left + plate.widthMm / 2;
    left += plate.widthMm + gapMm;
    const dv = between(rnd, -4, 4);
    const cx = width / 2 + scale * (Math.cos(angle) * centreU - Math.sin(angle) * dv);
    const cy = height / 2 + scale * (Math.sin(angle) * centreU + Math.cos(angle) * dv);
    return { ...plate, cx, cy, scale, angle: angle + (between(rnd, -1.5, 1.5) * Math.PI) / 180 };
  });
  const tilt = between(rnd, 0, 0.07);
  const tiltDirection = between(rnd, 0, 2 * Math.PI);
  return {
    seed,
    look,
    width,
    height,
    background,
    plates: placed,
    tiltX: (tilt * Math.cos(tiltDirection)) / width,
    tiltY: (tilt * Math.sin(tiltDirection)) / height,
    glare:
      rnd() < 0.4
        ? {
            x: between(rnd, 0.2, 0.8) * width,
            y: between(rnd, 0.2, 0.8) * height,
            sx: between(rnd, 0.05, 0.15) * width,
            sy: between(rnd, 0.05, 0.12) * height,
            amount: between(rnd, 0.2, 0.5),
          }
        : null,
    shadow:
      rnd() < 0.4
        ? (() => {
            const a = between(rnd, 0, 2 * Math.PI);
            return {
              nx: Math.cos(a),
              ny: Math.sin(a),
              offset: between(rnd, -0.25, 0.25) * width,
              soft: between(rnd, 0.04, 0.1) * width,
              depth: between(rnd, 0.15, 0.35),
            };
          })()
        : null,
    light: { gx: between(rnd, -0.15, 0.15), gy: between(rnd, -0.15, 0.15) },
    noise: between(rnd, 1.5, 5),
    format: rnd() < 0.75 ? 'jpeg' : rnd() < 0.5 ? 'png' : 'webp',
    quality: Math.round(between(rnd, 50, 90)),
    orientation: rnd() < 0.7 ? 1 : pick(rnd, [3, 6, 8] as const),
  };
}

/** Plate millimetres → displayed image pixels (rotation, scale, then the projective tilt about the image centre). */
export function plateToImage(photo: PhotoScene, plate: PlateScene, u: number, v: number): [number, number] {
  const du = u - plate.widthMm / 2;
  const dv = v - plate.heightMm / 2;
  const c = Math.cos(plate.angle);
  const s = Math.sin(plate.angle);
  const qx = plate.cx - photo.width / 2 + plate.scale * (c * du - s * dv);
  const qy = plate.cy - photo.height / 2 + plate.scale * (s * du + c * dv);
  const w = 1 + photo.tiltX * qx + photo.tiltY * qy;
  return [qx / w + photo.width / 2, qy / w + photo.height / 2];
}

/** Displayed image pixels → plate millimetres (the inverse of plateToImage). */
export function imageToPlate(photo: PhotoScene, plate: PlateScene, x: number, y: number): [number, number] {
  const px = x - photo.width / 2;
  const py = y - photo.height / 2;
  // qx − px(tiltX·qx + tiltY·qy) = px, likewise for y: a 2×2 linear system.
  const a11 = 1 - px * photo.tiltX,
    a12 = -px * photo.tiltY,
    a21 = -py * photo.tiltX,
    a22 = 1 - py * photo.tiltY;
  const det = a11 * a22 - a12 * a21;
  const qx = (px * a22 - a12 * py) / det;
  const qy = (a11 * py - a21 * px) / det;
  const rx = (qx - (plate.cx - photo.width / 2)) / plate.scale;
  const ry = (qy - (plate.cy - photo.height / 2)) / plate.scale;
  const c = Math.cos(plate.angle);
  const s = Math.sin(plate.angle);
  return [c * rx + s * ry + plate.widthMm / 2, -s * rx + c * ry + plate.heightMm / 2];
}
