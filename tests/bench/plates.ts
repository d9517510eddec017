/**
 * Plate reader benchmark (npm run bench:plates [-- --from N --count N --look LOOK --verbose]).
 *
 * Draws its own photos with known geometry (tests/bench/plates-photo.ts: every look, 1–3 plates a photo, fraction
 * plates of 8–14 lanes, pencil circles only, streaks, rotation and slight perspective, glare, shadow, uneven light,
 * JPEG/WebP/PNG, low resolution, EXIF orientation), reads each with the server's reader, and prints by look and
 * overall: plates found %, lanes right %, spots within 0.03 Rf %, extra spots %, Rf MAE, ms a photo (reading only).
 * The reader was developed on seeds 1000–1999; the default printed range starts at 50000 and was not used to tune it.
 * Last line: `plates_found_pct=… lanes_right_pct=… spots_within_pct=… extra_pct=… rf_mae=… ms_per_photo=…`.
 */
import { performance } from 'node:perf_hooks';
import { readPlates } from '../../server/features/plates/reader';
import { generatePhoto } from './plates-photo';
import { PLATE_LOOKS, type PlateLook } from './plates-scene';
import { scoreReading, type PhotoScore } from './plates-score';

function option(name: string): string | undefined {
  const at = process.argv.indexOf(`--${name}`);
  return at >= 0 ? process.argv[at + 1] : undefined;
}

const from = Number(option('from') ?? 50000);
const count = Number(option('count') ?? 96);
const onlyLook = option('look') as PlateLook | undefined;
const verbose = process.argv.includes('--verbose');

type Tally = PhotoScore & { photos: number; ms: number[]; failures: number };
const empty = (): Tally => ({
  plates: 0,
  platesFound: 0,
  lanes: 0,
  lanesRight: 0,
  spots: 0,
  spotsWithin: 0,
  detected: 0,
  extra: 0,
  errors: [],
  kindRight: 0,
  kindChecked: 0,
  photos: 0,
  ms: [],
  failures: 0,
});

function add(tally: Tally, score: PhotoScore, ms: number, failed: boolean) {
  for (const key of [
    'plates',
    'platesFound',
    'lanes',
    'lanesRight',
    'spots',
    'spotsWithin',
    'detected',
    'extra',
    'kindRight',
    'kindChecked',
  ] as const)
    tally[key] += score[key];
  tally.errors.push(...score.errors);
  tally.photos++;
  tally.ms.push(ms);
  if (failed) tally.failures++;
}

const pct = (part: number, whole: number) => (whole ? ((100 * part) / whole).toFixed(1) : '–');
function summary(tally: Tally) {
  const mae = tally.errors.length ? tally.errors.reduce((s, e) => s + e, 0) / tally.errors.length : NaN;
  const sorted = [...tally.ms].sort((a, b) => a - b);
  return {
    photos: tally.photos,
    plates: tally.plates,
    platesFound: pct(tally.platesFound, tally.plates),
    lanesRight: pct(tally.lanesRight, tally.lanes),
    spotsWithin: pct(tally.spotsWithin, tally.spots),
    extra: pct(tally.extra, tally.detected),
    mae: mae.toFixed(4),
    kind: pct(tally.kindRight, tally.kindChecked),
    ms: (tally.ms.reduce((s, v) => s + v, 0) / Math.max(1, tally.ms.length)).toFixed(0),
    p95: sorted.length ? sorted[Math.min(sorted.length - 1, Math.ceil(0.95 * sorted.length) - 1)].toFixed(0) : '–',
    refused: tally.failures,
  };
}

const byLook = new Map<string, Tally>(PLATE_LOOKS.map((look) => [look, empty()]));
const overall = empty();
for (let i = 0; i < count; i++) {
  const seed = from + i;
  const look = onlyLook ?? PLATE_LOOKS[i % PLATE_LOOKS.length];
  const photo = await generatePhoto(seed, look);
  const started = performance.now();
  const outcome = await readPlates(photo.bytes);
  const ms = performance.now() - started;
  const score = scoreReading(photo.truth.plates, outcome.ok ? outcome.reading : null);
  add(byLook.get(look)!, score, ms, !outcome.ok);
  add(overall, score, ms, !outcome.ok);
  if (verbose) {
    const note = outcome.ok ? '' : ` refused: ${outcome.missing}`;
    console.log(
      `seed ${seed} ${look} ${photo.scene.width}x${photo.scene.height} o${photo.scene.orientation} ` +
        `${photo.scene.background} plates ${score.platesFound}/${score.plates} lanes ${score.lanesRight}/${score.lanes} ` +
        `spots ${score.spotsWithin}/${score.spots} extra ${score.extra}/${score.detected} ${ms.toFixed(0)} ms${note}`,
    );
  }
}

console.log(`\nplate reader on ${count} generated photos, seeds ${from}–${from + count - 1}\n`);
console.log(
  'look          photos plates  found%  lanes%  spots≤0.03%  extra%  Rf MAE  kind%  ms/photo  p95 ms  refused',
);
const row = (name: string, tally: Tally) => {
  const s = summary(tally);
  console.log(
    `${name.padEnd(13)} ${String(s.photos).padStart(6)} ${String(s.plates).padStart(6)} ` +
      `${s.platesFound.padStart(7)} ${s.lanesRight.padStart(7)} ${s.spotsWithin.padStart(12)} ${s.extra.padStart(7)} ` +
      `${s.mae.padStart(7)} ${s.kind.padStart(6)} ${s.ms.padStart(9)} ${s.p95.padStart(7)} ${String(s.refused).padStart(8)}`,
  );
};
for (const [look, tally] of byLook) if (tally.photos) row(look, tally);
row('overall', overall);
const s = summary(overall);
console.log(
  `\nplates_found_pct=${s.platesFound} lanes_right_pct=${s.lanesRight} spots_within_pct=${s.spotsWithin} ` +
    `extra_pct=${s.extra} rf_mae=${s.mae} ms_per_photo=${s.ms}`,
);
