/** Ticks at round steps (1, 2 or 5 × 10ⁿ) covering [min, max], about `count` of them. */
export function niceTicks(min: number, max: number, count = 5): number[] {
  if (!Number.isFinite(min) || !Number.isFinite(max)) return [];
  if (min === max) return [min];
  const raw = (max - min) / Math.max(1, count);
  const power = 10 ** Math.floor(Math.log10(raw));
  const step = [1, 2, 5, 10].map((m) => m * power).find((s) => s >= raw) ?? 10 * power;
  const first = Math.ceil(min / step - 1e-9) * step;
  const ticks: number[] = [];
  for (let v = first; v <= max + step * 1e-9; v += step) ticks.push(Number(v.toPrecision(12)));
  return ticks;
}

/** Widens [min, max] to round numbers so the data does not touch the frame. */
export function niceDomain(values: number[], fallback: [number, number] = [0, 1]): [number, number] {
  const finite = values.filter(Number.isFinite);
  if (!finite.length) return fallback;
  let min = Math.min(...finite);
  let max = Math.max(...finite);
  if (min === max) {
    const pad = Math.abs(min) * 0.1 || 1;
    min -= pad;
    max += pad;
  }
  const ticks = niceTicks(min, max, 5);
  const step = ticks.length > 1 ? ticks[1] - ticks[0] : max - min;
  return [Math.floor(min / step) * step, Math.ceil(max / step) * step];
}

/** A linear map from a data domain onto a pixel range. */
export function linear([d0, d1]: [number, number], [r0, r1]: [number, number]): (v: number) => number {
  const span = d1 - d0 || 1;
  return (v) => r0 + ((v - d0) / span) * (r1 - r0);
}

export interface Bin {
  from: number;
  to: number;
  count: number;
}

/** Counts values into equal bins of `width` starting at `from` (a value on an edge goes to the upper bin; the last bin is closed). */
export function binValues(values: number[], from: number, to: number, width: number): Bin[] {
  const n = Math.max(1, Math.ceil((to - from) / width - 1e-9));
  const bins: Bin[] = Array.from({ length: n }, (_, i) => ({
    from: from + i * width,
    to: Math.min(to, from + (i + 1) * width),
    count: 0,
  }));
  for (const v of values) {
    if (!Number.isFinite(v) || v < from || v > to) continue;
    bins[Math.min(n - 1, Math.floor((v - from) / width + 1e-9))].count++;
  }
  return bins;
}

/** A figure with sensible precision for a tick step. */
export function formatTick(v: number, step: number): string {
  const decimals = Math.max(0, Math.min(4, -Math.floor(Math.log10(Math.abs(step) || 1))));
  return v.toFixed(decimals);
}
