import sharp from 'sharp';
import { applyHomography, type Point } from './geometry';
import { findLanes, readingBand } from './plate-lanes';
import { findLines, lineAt } from './plate-lines';
import { departure, straighten } from './plate-frame';
import { findSpots, inkMasks } from './plate-spots';
import { refineCorners } from './plate-edges';
import { findPlates, type RgbImage } from './segment';
import type { PlateReading, PlateReadSpot } from '../../../shared/schemas/plates';

/** Longest side, px, at which plates are read; larger photos are reduced first (a phone photo is 4000 px). */
const READ_SIDE_PX = 1400;
/** Longest side, px, at which plates are looked for. */
const FIND_SIDE_PX = 560;

export type ReadOutcome =
  | { ok: true; reading: PlateReading }
  | {
      ok: false;
      missing: 'plate' | 'origin' | 'front' | 'origin and front';
      message: string;
      width: number;
      height: number;
    };

const round = (value: number, digits = 1) => Number(value.toFixed(digits));

/** Decodes, orients (EXIF) and reduces a photo; throws if sharp cannot decode its pixels. */
async function decodePhoto(bytes: Buffer): Promise<{ image: RgbImage; width: number; height: number }> {
  const oriented = sharp(bytes, { failOn: 'error' }).rotate();
  const { data, info } = await oriented
    .resize({ width: READ_SIDE_PX, height: READ_SIDE_PX, fit: 'inside', withoutEnlargement: true })
    .removeAlpha()
    .toColourspace('srgb')
    .raw()
    .toBuffer({ resolveWithObject: true });
  const metadata = await sharp(bytes).metadata();
  const turned = (metadata.orientation ?? 1) >= 5;
  const width = (turned ? metadata.height : metadata.width) ?? info.width;
  const height = (turned ? metadata.width : metadata.height) ?? info.height;
  return { image: { width: info.width, height: info.height, data }, width, height };
}

async function reduce(image: RgbImage, side: number): Promise<RgbImage> {
  if (Math.max(image.width, image.height) <= side) return image;
  const { data, info } = await sharp(image.data, { raw: { width: image.width, height: image.height, channels: 3 } })
    .resize({ width: side, height: side, fit: 'inside' })
    .raw()
    .toBuffer({ resolveWithObject: true });
  return { width: info.width, height: info.height, data };
}

/**
 * Reads every plate of a photo: plates (segment.ts), each straightened (plate-frame.ts), its background flattened,
 * its origin and front (plate-lines.ts), lanes (plate-lanes.ts) and spots (plate-spots.ts); answers in the pixels of
 * the photo as displayed. Rf = (origin − spot) / (origin − front), measured in the plate's own frame along the lane.
 */
export async function readPlates(bytes: Buffer): Promise<ReadOutcome> {
  const { image, width, height } = await decodePhoto(bytes);
  const small = await reduce(image, FIND_SIDE_PX);
  const toRead = image.width / small.width;
  const toDisplay = width / image.width;
  const found = findPlates(small);
  if (found.length === 0) {
    return {
      ok: false,
      missing: 'plate',
      width,
      height,
      message:
        'No TLC plate was found in the photo: photograph the plate on a plain, contrasting surface, whole and filling much of the frame.',
    };
  }
  const plates: PlateReading['plates'] = [];
  const misses: string[] = [];
  for (const plate of found) {
    const frame = straighten(
      image,
      refineCorners(
        image,
        plate.corners.map(([x, y]) => [x * toRead, y * toRead] as Point),
      ),
    );
    if (!frame) continue;
    const map = departure(frame);
    const { origin, front } = findLines(map);
    if (!origin || !front) {
      misses.push(!origin && !front ? 'origin and front' : !origin ? 'origin' : 'front');
      continue;
    }
    const display = (x: number, y: number): [number, number] => {
      const [px, py] = applyHomography(frame.toPhoto, [x, y]);
      return [round(px * toDisplay), round(py * toDisplay)];
    };
    const band = readingBand(map, origin, front, 2.5 * frame.scale + 1);
    const masks = inkMasks(map, band);
    const laneXs = masks ? findLanes(map, origin, band, masks.filled) : [];
    const run = (origin.left + origin.right - front.left - front.right) / 2;
    const spots = masks ? findSpots(map, band, masks, laneXs, run) : [];
    const rfAt = (x: number, y: number) => {
      const o = lineAt(origin, x, frame.width),
        f = lineAt(front, x, frame.width);
      return (o - y) / (o - f);
    };
    plates.push({
      corners: [display(0, 0), display(frame.width, 0), display(frame.width, frame.height), display(0, frame.height)],
      origin: [display(0, origin.left), display(frame.width, origin.right)],
      front: [display(0, front.left), display(frame.width, front.right)],
      lanes: laneXs.map((laneX, index) => {
        const laneSpots: PlateReadSpot[] = spots
          .filter((spot) => spot.lane === index)
          .map((spot) => {
            const [x, y] = display(spot.x, spot.y);
            const streakEnds =
              spot.kind === 'streak' && spot.top !== undefined && spot.bottom !== undefined
                ? { rfLow: round(rfAt(spot.x, spot.bottom), 3), rfHigh: round(rfAt(spot.x, spot.top), 3) }
                : {};
            return {
              x,
              y,
              rf: round(rfAt(spot.x, spot.y), 3),
              kind: spot.kind,
              ...streakEnds,
              size: round(spot.radius * 2 * Math.hypot(frame.toPhoto[0], frame.toPhoto[3]) * toDisplay),
              intensity: round(spot.intensity),
              confidence: round(spot.confidence, 2),
            };
          });
        return {
          x: display(laneX, lineAt(origin, laneX, frame.width))[0],
          spots: laneSpots.sort((a, b) => a.rf - b.rf),
        };
      }),
    });
  }
  if (plates.length === 0) {
    const missingWords = {
      'origin and front': 'origin and solvent front were',
      origin: 'origin (pencil start line) was',
      front: 'solvent front was',
    } as const;
    const which =
      misses.includes('origin and front') || (misses.includes('origin') && misses.includes('front'))
        ? 'origin and front'
        : misses[0] === 'origin'
          ? 'origin'
          : 'front';
    return {
      ok: false,
      missing: which,
      width,
      height,
      message:
        `A plate was found but its ` +
        `${missingWords[which]} ` +
        `not: draw the line, or at least a tick at both edges, in pencil and photograph again.`,
    };
  }
  return {
    ok: true,
    reading: {
      width,
      height,
      plates,
      ...(misses.length
        ? { warnings: misses.map((what) => `One plate was skipped: its ${what} could not be found.`) }
        : {}),
    },
  };
}
