import { z } from 'zod';

/** Every record id is a UUID the client may generate itself (offline creation needs no server round trip). */
export const idSchema = z.uuid({ message: 'must be a UUID' });

export const latSchema = z.number().min(-90, 'latitude must be between -90 and 90').max(90, 'latitude must be between -90 and 90');
export const lonSchema = z
  .number()
  .min(-180, 'longitude must be between -180 and 180')
  .max(180, 'longitude must be between -180 and 180');
export const latLonSchema = z.strictObject({ lat: latSchema, lon: lonSchema });
export type LatLon = z.infer<typeof latLonSchema>;

/** ISO-8601 instant, as the server and the sync protocol write it. */
export const isoInstantSchema = z.iso.datetime({ offset: true, message: 'must be an ISO date-time' });
/** Calendar day, YYYY-MM-DD. */
export const isoDaySchema = z.iso.date({ message: 'must be a date as YYYY-MM-DD' });

export const shortText = (max: number, what = 'text') =>
  z.string().trim().max(max, `${what} must be at most ${max} characters`);
export const nameText = (max = 120, what = 'name') =>
  z.string().trim().min(1, `${what} is required`).max(max, `${what} must be at most ${max} characters`);

/** Columns every stored record carries; the sync layer relies on them. */
export const recordMetaSchema = z.object({
  id: idSchema,
  createdAt: isoInstantSchema,
  updatedAt: isoInstantSchema,
  deletedAt: isoInstantSchema.nullable(),
});
export type RecordMeta = z.infer<typeof recordMetaSchema>;
