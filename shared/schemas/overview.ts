import { z } from 'zod';

/** A count of the base now and how much of it arrived since the start of this month (UTC). */
const growthSchema = z.object({ total: z.number().int(), thisMonth: z.number().int() });

/** `GET /api/overview`: how the group's base is growing (active records only). */
export const overviewSchema = z.object({
  /** Start of the current month (UTC), ISO. */
  monthStart: z.string(),
  records: growthSchema,
  /** Compounds with at least one active record; new = first record this month. */
  compounds: growthSchema,
  /** People who wrote an active record; new = first record this month. */
  contributors: growthSchema,
  /** Compound classes with at least one active record; new = first record this month. */
  classes: growthSchema,
  /** Active records that are invented demo data (seeders/), so the counts can say so. */
  demoRecords: z.number().int(),
});
export type Overview = z.infer<typeof overviewSchema>;
