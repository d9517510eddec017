import { createHash } from 'node:crypto';
import { Molecule } from 'openchemlib';

/** Options for a structure drawing. */
export interface DepictOptions {
  /** Largest width and height in px; the drawing is cropped to the structure (default 360 × 240). */
  width?: number;
  height?: number;
  /** Bond length cap in px so small molecules are not blown up (default 30). */
  bondLength?: number;
  /** The SVG element id; its styles are scoped by it. Default: derived from the ID code, stable. */
  id?: string;
}

/**
 * An SVG drawing of a molecule, OpenChemLib's depictor with clean options (../shared/STACK.md):
 * cropped to the structure, no chiral text, CIP or enhanced-stereo labels (wedges still show
 * configuration). About 1.5 ms. Coordinates are invented when the molecule has none (e.g. from an ID code).
 */
export function toSvg(mol: Molecule, options: DepictOptions = {}): string {
  const { width = 360, height = 240, bondLength = 30 } = options;
  const drawn = mol.getCompactCopy();
  if (drawn.getAllAtoms() > 1 && drawn.getAverageBondLength(true) === 0) drawn.inventCoordinates();
  const id = options.id ?? `mol-${createHash('sha1').update(drawn.getIDCode()).digest('hex').slice(0, 10)}`;
  return drawn.toSVG(width, height, id, {
    autoCrop: true,
    autoCropMargin: 8,
    maxAVBL: bondLength,
    suppressChiralText: true,
    suppressCIPParity: true,
    suppressESR: true,
  });
}

/** An SVG drawing straight from an OpenChemLib ID code (coordinates are invented). */
export function idcodeToSvg(idcode: string, options: DepictOptions = {}): string {
  return toSvg(Molecule.fromIDCode(idcode, true), options);
}
