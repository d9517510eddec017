import { z } from 'zod';

/** A point in pixels of the photo as displayed (EXIF orientation applied): [x, y], y down. */
export const pixelPointSchema = z.tuple([z.number(), z.number()]);
export type PixelPoint = z.infer<typeof pixelPointSchema>;

export const plateSpotKinds = ['spot', 'circle', 'streak'] as const;

/**
 * A mark read on a lane. Rf = (origin − spot) / (origin − front) along the lane in the plate's own frame; a streak
 * also gives the Rf of its lower and upper ends. `size` is the mark's diameter (px), `intensity` its strongest
 * departure from the plate's background (0–~255), `confidence` 0–1.
 */
export const plateReadSpotSchema = z.object({
  x: z.number(),
  y: z.number(),
  rf: z.number(),
  kind: z.enum(plateSpotKinds),
  rfLow: z.number().optional(),
  rfHigh: z.number().optional(),
  size: z.number().optional(),
  intensity: z.number().optional(),
  confidence: z.number().optional(),
});
export type PlateReadSpot = z.infer<typeof plateReadSpotSchema>;

export const plateReadLaneSchema = z.object({ x: z.number(), label: z.string().optional(), spots: z.array(plateReadSpotSchema) });
export type PlateReadLane = z.infer<typeof plateReadLaneSchema>;

/** One plate: corners top-left, top-right, bottom-right, bottom-left; origin and front from the left edge to the right. */
export const plateReadPlateSchema = z.object({
  corners: z.array(pixelPointSchema).length(4),
  origin: z.array(pixelPointSchema).length(2),
  front: z.array(pixelPointSchema).length(2),
  lanes: z.array(plateReadLaneSchema),
});
export type PlateReadPlate = z.infer<typeof plateReadPlateSchema>;

/** The answer of POST /api/plates/read: plates left to right, lanes left to right, spots by Rf ascending. */
export const plateReadingSchema = z.object({
  width: z.number().int(),
  height: z.number().int(),
  plates: z.array(plateReadPlateSchema),
  warnings: z.array(z.string()).optional(),
});
export type PlateReading = z.infer<typeof plateReadingSchema>;
