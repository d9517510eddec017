/** A point [x, y] in photo pixels. */
export type PlatePoint = [number, number];

function signedDistance([x, y]: PlatePoint, [a, b]: PlatePoint[]): number {
  const dx = b[0] - a[0],
    dy = b[1] - a[1];
  const length = Math.hypot(dx, dy) || 1;
  return ((x - a[0]) * dy - (y - a[1]) * dx) / length;
}

/**
 * Rf of a point between the origin and the front lines (each given by two points in the photo): its distance from
 * the origin over the front's distance from the origin, measured across the lines, so a plate photographed turned
 * a few degrees reads the same. Rf = distance travelled by the spot / distance travelled by the solvent front
 * (IUPAC, Compendium of Chemical Terminology, "retardation factor"). Null when the lines meet or coincide.
 */
export function rfBetweenLines(point: PlatePoint, origin: PlatePoint[], front: PlatePoint[]): number | null {
  const toPoint = signedDistance(point, origin);
  const middle: PlatePoint = [(front[0][0] + front[1][0]) / 2, (front[0][1] + front[1][1]) / 2];
  const toFront = signedDistance(middle, origin);
  if (Math.abs(toFront) < 1e-6) return null;
  return toPoint / toFront;
}
