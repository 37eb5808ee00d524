import { z } from 'zod';
import { latSchema, lonSchema, siteFieldsSchema } from '@/shared/schemas';

/** The site fields this form edits (the survey screens edit ground and the rest), with plain-words number errors. */
export const siteFormSchema = siteFieldsSchema.pick({ name: true, notes: true, accessNotes: true, rules: true }).extend({
  refLat: z.number({ error: 'enter the latitude in degrees, such as 44.81234' }).pipe(latSchema),
  refLon: z.number({ error: 'enter the longitude in degrees, such as -93.50210 (west is negative)' }).pipe(lonSchema),
});
export type SiteFormValues = z.infer<typeof siteFormSchema>;
