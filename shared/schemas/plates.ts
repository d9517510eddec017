import { z } from 'zod';

/** A point in pixels of the photo as displayed (EXIF orientation applied): [x, y], y down. */
const pixelPointSchema = z.tuple([z.number(), z.number()]);

const plateSpotKinds = ['spot', 'circle', 'streak'] as const;

/**
 * A mark read on a lane. Rf = (origin − spot) / (origin − front) along the lane in the plate's own frame; a streak
 * also gives the Rf of its lower and upper ends. `size` is the mark's diameter (px), `intensity` its strongest
 * departure from the plate's background (0–~255), `confidence` 0–1.
 */
const plateReadSpotSchema = z.object({
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

const plateReadLaneSchema = z.object({
  x: z.number(),
  label: z.string().optional(),
  spots: z.array(plateReadSpotSchema),
});

/** One plate: corners top-left, top-right, bottom-right, bottom-left; origin and front from the left edge to the right. */
const plateReadPlateSchema = z.object({
  corners: z.array(pixelPointSchema).length(4),
  origin: z.array(pixelPointSchema).length(2),
  front: z.array(pixelPointSchema).length(2),
  lanes: z.array(plateReadLaneSchema),
});

/** The answer of POST /api/plates/read: plates left to right, lanes left to right, spots by Rf ascending. */
export const plateReadingSchema = z.object({
  width: z.number().int(),
  height: z.number().int(),
  plates: z.array(plateReadPlateSchema),
  warnings: z.array(z.string()).optional(),
});
export type PlateReading = z.infer<typeof plateReadingSchema>;

/** What a lane holds, named by the chemist on the overlay. */
export const annotationLaneRoles = ['starting_material', 'co_spot', 'mixture', 'fraction', 'other'] as const;
export const annotationLaneRoleLabels: Record<(typeof annotationLaneRoles)[number], string> = {
  starting_material: 'SM',
  co_spot: 'co-spot',
  mixture: 'RM',
  fraction: 'fraction',
  other: 'other',
};
export const annotationSpotRoles = ['target', 'starting_material', 'by_product', 'unknown'] as const;

const coordinate = z.number().finite().min(-100_000).max(100_000);
const point = z.tuple([coordinate, coordinate]);

export const plateAnnotationSchema = z.object({
  plates: z
    .array(
      z.object({
        corners: z.array(point).length(4),
        origin: z.array(point).length(2),
        front: z.array(point).length(2),
        lanes: z
          .array(
            z.object({
              x: coordinate,
              label: z.string().trim().max(40).optional(),
              role: z.enum(annotationLaneRoles).optional(),
              fraction: z.number().int().min(0).max(10_000).optional(),
              spots: z
                .array(
                  z.object({
                    x: coordinate,
                    y: coordinate,
                    rf: z.number().min(-1).max(2),
                    kind: z.enum(plateSpotKinds),
                    role: z.enum(annotationSpotRoles).optional(),
                    rfLow: z.number().optional(),
                    rfHigh: z.number().optional(),
                  }),
                )
                .max(40),
            }),
          )
          .max(40),
      }),
    )
    .max(12),
  /** The proposed pool of a fractions plate and the monitoring sentences, as shown when saved. */
  pooling: z.string().max(500).optional(),
  monitoring: z.array(z.string().max(300)).max(12).optional(),
});
export type PlateAnnotation = z.infer<typeof plateAnnotationSchema>;

export const photoAnnotationSchema = z.object({
  photoId: z.number().int(),
  revision: z.number().int(),
  annotation: plateAnnotationSchema,
  savedBy: z.string().nullable(),
  savedAt: z.string(),
});
export type PhotoAnnotation = z.infer<typeof photoAnnotationSchema>;
export const photoAnnotationHistorySchema = z.object({ items: z.array(photoAnnotationSchema) });
