/** Where things sit on a drawn plate strip, in SVG user units (px). */
export interface StripGeometry {
  /** Width of one lane of silica. */
  laneWidth: number;
  /** Room right of a lane for the Rf figures (0 when not drawn). */
  figureWidth: number;
  gap: number;
  /** Room left of the first lane for the Rf scale (0 when not drawn). */
  axisWidth: number;
  plateHeight: number;
  /** y of the solvent front line (Rf 1). */
  frontY: number;
  /** y of the origin line (Rf 0). */
  originY: number;
  /** Room under the plate for lane labels (0 when not drawn). */
  labelHeight: number;
  spotRx: number;
  spotRy: number;
  fontSize: number;
}

export const stripSizes: Record<'sm' | 'lg', StripGeometry> = {
  sm: {
    laneWidth: 18,
    figureWidth: 0,
    gap: 5,
    axisWidth: 0,
    plateHeight: 60,
    frontY: 6,
    originY: 53,
    labelHeight: 0,
    spotRx: 3.4,
    spotRy: 2.7,
    fontSize: 0,
  },
  lg: {
    laneWidth: 40,
    figureWidth: 34,
    gap: 10,
    axisWidth: 26,
    plateHeight: 220,
    frontY: 16,
    originY: 198,
    labelHeight: 34,
    spotRx: 7,
    spotRy: 5,
    fontSize: 10,
  },
};

/** Rf is distance of the spot over distance of the front, both from the origin; clamped to 0–1 for drawing. */
export function spotY(rf: number, g: Pick<StripGeometry, 'frontY' | 'originY'>): number {
  const clamped = Math.min(1, Math.max(0, rf));
  return g.originY - clamped * (g.originY - g.frontY);
}

/** x of the left edge of lane `index`. */
export function laneX(index: number, g: StripGeometry): number {
  return g.axisWidth + index * (g.laneWidth + g.figureWidth + g.gap);
}

/** Total drawing size for `lanes` lanes. */
export function stripSize(lanes: number, g: StripGeometry): { width: number; height: number } {
  const n = Math.max(1, lanes);
  return { width: laneX(n, g) - g.gap, height: g.plateHeight + g.labelHeight };
}

/**
 * Moves figure labels apart so that none is closer than `minGap` to the next, keeping their order
 * (labels are y positions; returned in the input order).
 */
export function spreadLabels(ys: number[], minGap: number): number[] {
  const order = ys.map((y, i) => ({ y, i })).sort((a, b) => a.y - b.y);
  for (let k = 1; k < order.length; k++) {
    if (order[k].y - order[k - 1].y < minGap) order[k].y = order[k - 1].y + minGap;
  }
  const out = new Array<number>(ys.length);
  for (const o of order) out[o.i] = o.y;
  return out;
}

/** Splits a lane label into at most two short lines at spaces. */
export function wrapLabel(label: string, maxChars: number): string[] {
  if (label.length <= maxChars) return [label];
  const words = label.split(' ');
  let first = '';
  while (words.length && (first + ' ' + words[0]).trim().length <= maxChars)
    first = (first + ' ' + words.shift()).trim();
  if (!first) first = words.shift() ?? '';
  const rest = words.join(' ');
  return rest ? [first, rest.length > maxChars ? rest.slice(0, maxChars - 1) + '…' : rest] : [first];
}
