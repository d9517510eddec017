/**
 * Draws a generated plate photo (tests/bench/plates-scene.ts) into raw RGB pixels and encodes it with sharp, with
 * its ground truth in the displayed image's pixels (EXIF orientation applied), in the API's own shape.
 */
import sharp from 'sharp';
import {
  imageToPlate,
  makePhotoScene,
  plateColour,
  plateToImage,
  seededRandom,
  type PhotoScene,
  type PlateLook,
  type PlateScene,
  type SpotTruth,
} from './plates-scene';

export type TruthSpot = { x: number; y: number; rf: number; kind: SpotTruth['kind']; rfLow?: number; rfHigh?: number };
export type TruthPlate = {
  corners: [number, number][];
  origin: [number, number][];
  front: [number, number][];
  kind: PlateScene['kind'];
  lanes: { x: number; label: string; spots: TruthSpot[] }[];
};
export type GeneratedPhoto = {
  scene: PhotoScene;
  bytes: Buffer;
  contentType: string;
  truth: { width: number; height: number; plates: TruthPlate[] };
};

const GRAPHITE: [number, number, number] = [78, 78, 84];
const clamp01 = (value: number) => (value < 0 ? 0 : value > 1 ? 1 : value);

/** Coverage of a stroke of width `width` (mm) at distance `distance` (mm) when a pixel is `pixel` mm wide. */
function stroke(distance: number, width: number, pixel: number): number {
  return clamp01((width / 2 + pixel / 2 - distance) / pixel) * Math.min(1, width / pixel);
}

function mix(colour: number[], ink: readonly number[], alpha: number) {
  if (alpha <= 0) return;
  for (let c = 0; c < 3; c++) colour[c] = colour[c] * (1 - alpha) + ink[c] * alpha;
}

/** Small hand-written marks under the origin: two or three short strokes a label. */
function labelStrokes(u: number, v: number, label: string): [number, number, number, number][] {
  const rnd = seededRandom(label.charCodeAt(0) * 31 + Math.round(u * 10));
  const strokes: [number, number, number, number][] = [];
  for (let i = 0; i < Math.min(3, label.length + 1); i++) {
    const x0 = u - 1.2 + rnd() * 2.4,
      y0 = v + rnd() * 2;
    strokes.push([x0, y0, x0 + (rnd() - 0.5) * 1.6, y0 + 0.6 + rnd() * 1.4]);
  }
  return strokes;
}

function segmentDistance(u: number, v: number, [x0, y0, x1, y1]: [number, number, number, number]): number {
  const dx = x1 - x0,
    dy = y1 - y0;
  const t = clamp01(((u - x0) * dx + (v - y0) * dy) / (dx * dx + dy * dy || 1));
  return Math.hypot(u - x0 - t * dx, v - y0 - t * dy);
}

function spotAlpha(spot: SpotTruth, u: number, v: number, originV: number, frontV: number): number {
  let rho: number;
  if (spot.kind === 'streak') {
    const run = originV - frontV;
    const top = originV - (spot.rfHigh ?? spot.rf) * run,
      bottom = originV - (spot.rfLow ?? spot.rf) * run;
    const dv = v < top ? (top - v) / (spot.radius * 0.8) : v > bottom ? (v - bottom) / (spot.radius * 0.8) : 0;
    rho = Math.hypot((u - spot.u) / (spot.radius * 0.9), dv);
  } else {
    rho = Math.hypot((u - spot.u) / spot.radius, (v - spot.v) / (spot.radius * 0.8));
  }
  return spot.strength / (1 + Math.exp((rho - 1) / 0.18));
}

/** The colour of plate millimetre (u, v), `pixel` mm a pixel. */
function plateAt(look: PlateLook, plate: PlateScene, u: number, v: number, pixel: number): number[] {
  const colour = [...plateColour(look)];
  const stain = 1 + 0.04 * Math.sin(u * 0.31 + plate.widthMm) * Math.sin(v * 0.17 + plate.heightMm);
  for (let c = 0; c < 3; c++) colour[c] *= stain;
  for (const lane of plate.lanes) {
    if (Math.abs(u - lane.u) > 6) continue;
    for (const spot of lane.spots) {
      if (look !== 'pencil') mix(colour, spot.colour, spotAlpha(spot, u, v, plate.originV, plate.frontV));
      if (spot.circled) {
        const angle = Math.atan2(v - spot.v, u - spot.u);
        const ring = spot.radius * 1.45 + 0.2 * Math.sin(3 * angle + spot.u);
        mix(colour, GRAPHITE, 0.6 * stroke(Math.abs(Math.hypot(u - spot.u, v - spot.v) - ring), 0.32, pixel));
      }
    }
    mix(colour, GRAPHITE, 0.65 * stroke(Math.hypot(u - lane.u, v - plate.originV), 0.7, pixel));
    for (const segment of labelStrokes(lane.u, plate.originV + 2.5, lane.label))
      mix(colour, GRAPHITE, 0.55 * stroke(segmentDistance(u, v, segment), 0.3, pixel));
  }
  mix(colour, GRAPHITE, 0.5 * stroke(Math.abs(v - plate.originV), 0.3, pixel));
  const edgeTick = u < 4 || u > plate.widthMm - 4;
  if (plate.frontStyle === 'line' || edgeTick)
    mix(colour, GRAPHITE, 0.5 * stroke(Math.abs(v - plate.frontV), 0.3, pixel));
  return colour;
}

function backgroundAt(scene: PhotoScene, x: number, y: number): number[] {
  const texture = Math.sin(x * 0.9) * Math.sin(y * 0.9) + 0.5 * Math.sin((x + y) * 0.23);
  if (scene.background === 'towel') return [226 + 6 * texture, 224 + 6 * texture, 218 + 6 * texture];
  if (scene.background === 'uv-floor') return [32 + 3 * texture, 26 + 3 * texture, 44 + 4 * texture];
  return [58 + 4 * texture, 54 + 4 * texture, 50 + 4 * texture];
}

/** Raw RGB pixels of the photo as displayed, plus its truth. */
export function drawPhoto(scene: PhotoScene): { pixels: Buffer; truth: GeneratedPhoto['truth'] } {
  const { width, height } = scene;
  const pixels = Buffer.alloc(width * height * 3);
  const rnd = seededRandom(scene.seed * 104729 + 3);
  const gauss = () => Math.sqrt(-2 * Math.log(rnd() + 1e-12)) * Math.cos(2 * Math.PI * rnd());
  const boxes = scene.plates.map((plate) => {
    const corners = [
      [0, 0],
      [plate.widthMm, 0],
      [plate.widthMm, plate.heightMm],
      [0, plate.heightMm],
    ].map(([u, v]) => plateToImage(scene, plate, u, v));
    return {
      x0: Math.floor(Math.min(...corners.map((p) => p[0]))) - 2,
      x1: Math.ceil(Math.max(...corners.map((p) => p[0]))) + 2,
      y0: Math.floor(Math.min(...corners.map((p) => p[1]))) - 2,
      y1: Math.ceil(Math.max(...corners.map((p) => p[1]))) + 2,
    };
  });
  for (let y = 0; y < height; y++) {
    for (let x = 0; x < width; x++) {
      let colour = backgroundAt(scene, x, y);
      scene.plates.forEach((plate, index) => {
        const box = boxes[index];
        if (x < box.x0 || x > box.x1 || y < box.y0 || y > box.y1) return;
        const [u, v] = imageToPlate(scene, plate, x + 0.5, y + 0.5);
        const pixel = 1 / plate.scale;
        const inside = clamp01(Math.min(u, plate.widthMm - u, v, plate.heightMm - v) / pixel + 0.5);
        if (inside <= 0) return;
        const onPlate = plateAt(scene.look, plate, u, v, pixel);
        colour = colour.map((value, c) => value * (1 - inside) + onPlate[c] * inside);
      });
      const light = 1 + scene.light.gx * ((2 * x) / width - 1) + scene.light.gy * ((2 * y) / height - 1);
      let shade = 1;
      if (scene.shadow)
        shade =
          1 -
          scene.shadow.depth *
            clamp01(
              0.5 +
                (x * scene.shadow.nx +
                  y * scene.shadow.ny -
                  scene.shadow.offset -
                  (width * scene.shadow.nx + height * scene.shadow.ny) / 2) /
                  scene.shadow.soft,
            );
      const glare = scene.glare
        ? scene.glare.amount *
          Math.exp(-0.5 * (((x - scene.glare.x) / scene.glare.sx) ** 2 + ((y - scene.glare.y) / scene.glare.sy) ** 2))
        : 0;
      const at = (y * width + x) * 3;
      for (let c = 0; c < 3; c++) {
        const lit = colour[c] * light * shade;
        pixels[at + c] = Math.max(0, Math.min(255, Math.round(lit + (255 - lit) * glare + scene.noise * gauss())));
      }
    }
  }
  const plates = scene.plates
    .map((plate): TruthPlate => {
      const at = (u: number, v: number) => plateToImage(scene, plate, u, v);
      return {
        kind: plate.kind,
        corners: [at(0, 0), at(plate.widthMm, 0), at(plate.widthMm, plate.heightMm), at(0, plate.heightMm)],
        origin: [at(0, plate.originV), at(plate.widthMm, plate.originV)],
        front: [at(0, plate.frontV), at(plate.widthMm, plate.frontV)],
        lanes: plate.lanes.map((lane) => ({
          x: at(lane.u, plate.originV)[0],
          label: lane.label,
          spots: lane.spots.map((spot) => {
            const [x, y] = at(spot.u, spot.v);
            return {
              x,
              y,
              rf: spot.rf,
              kind: spot.circled ? 'circle' : spot.kind,
              ...(spot.kind === 'streak' ? { rfLow: spot.rfLow, rfHigh: spot.rfHigh } : {}),
            };
          }),
        })),
      };
    })
    .sort((a, b) => a.corners[0][0] - b.corners[0][0]);
  return { pixels, truth: { width, height, plates } };
}

/** Turns displayed pixels into the stored ones for an EXIF orientation (3: 180°, 6: shown turned 90° clockwise, 8: anticlockwise). */
async function storedFor(
  pixels: Buffer,
  width: number,
  height: number,
  orientation: PhotoScene['orientation'],
): Promise<{ data: Buffer; width: number; height: number }> {
  if (orientation === 1) return { data: pixels, width, height };
  const angle = orientation === 3 ? 180 : orientation === 6 ? 270 : 90;
  const { data, info } = await sharp(pixels, { raw: { width, height, channels: 3 } })
    .rotate(angle)
    .raw()
    .toBuffer({ resolveWithObject: true });
  return { data, width: info.width, height: info.height };
}

/** The encoded photo (JPEG, PNG or WebP, with its EXIF orientation) and its truth. */
export async function generatePhoto(seed: number, look?: PlateLook): Promise<GeneratedPhoto> {
  const scene = makePhotoScene(seed, look);
  // Phones write the orientation tag into JPEGs; browsers do not all honour it in PNG or WebP (Chromium 156 ignores
  // it in WebP), so only JPEGs are stored turned.
  if (scene.format !== 'jpeg') scene.orientation = 1;
  const { pixels, truth } = drawPhoto(scene);
  const stored = await storedFor(pixels, scene.width, scene.height, scene.orientation);
  let image = sharp(stored.data, { raw: { width: stored.width, height: stored.height, channels: 3 } });
  if (scene.orientation !== 1) image = image.withMetadata({ orientation: scene.orientation });
  const bytes =
    scene.format === 'png'
      ? await image.png().toBuffer()
      : scene.format === 'webp'
        ? await image.webp({ quality: scene.quality }).toBuffer()
        : await image.jpeg({ quality: scene.quality }).toBuffer();
  return { scene, bytes, contentType: `image/${scene.format}`, truth };
}
