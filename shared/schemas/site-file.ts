import { z } from 'zod';
import { GROUND_CLASS_NAMES, isGroundClassName } from '../ground';
import { latSchema, lonSchema } from './common';
import { BAND_NAMES, COAX_TYPES, HAZARD_KINDS, MODES, PURPOSES, SUPPORT_KINDS } from './records';

/*
 * The site file, format v1: one site's survey and plan inputs as a single JSON document.
 * The app exports and imports it (backup, sharing between clubs) and the command line reads it.
 * Every object is strict: an unknown field is an error naming its path, so a typo ("heigthM") is
 * never silently ignored. Units are SI and named in the field. README "The site file (format v1)"
 * documents every field.
 */

export const SITE_FILE_VERSION = 1;

const id = z
  .string()
  .trim()
  .min(1, 'id is required')
  .max(80, 'id must be at most 80 characters');
const latLon = z.strictObject({ lat: latSchema, lon: lonSchema });

/** A ground class name from shared/ground, or measured constants. */
export const siteGroundSchema = z.union(
  [
    z
      .string()
      .trim()
      .refine(isGroundClassName, { message: `unknown ground class (known: ${GROUND_CLASS_NAMES.join(', ')})` }),
    z.strictObject({
      sigmaSPerM: z.number().positive('conductivity must be above 0').max(10, 'conductivity above 10 S/m is not ground'),
      epsR: z.number().min(1, 'relative permittivity is at least 1').max(100, 'relative permittivity above 100 is not ground'),
    }),
  ],
  { message: 'ground must be a class name or {"sigmaSPerM", "epsR"}' },
);

/** Default number of wire ends a support carries when the file does not say (mast: one pulley). */
export const DEFAULT_MAX_ENDS = { tree: 2, mast: 1, structure: 2 } as const;

export const siteSupportSchema = z
  .strictObject({
    id,
    kind: z.enum(SUPPORT_KINDS, { message: 'kind must be tree, mast or structure' }),
    lat: latSchema,
    lon: lonSchema,
    /** Overall height above the base: a falling support reaches this far. */
    heightM: z.number().positive('height must be above 0').max(120, 'no support here is taller than 120 m'),
    /** Highest point a line can be attached; defaults to heightM. */
    attachHeightM: z.number().positive('attachment height must be above 0').max(120).optional(),
    /** Wire ends (or an inverted-V apex) the support can carry; default by kind (DEFAULT_MAX_ENDS). */
    maxEnds: z.number().int('maxEnds must be a whole number').min(1).max(4).optional(),
  })
  .refine((s) => s.attachHeightM === undefined || s.attachHeightM <= s.heightM, {
    message: 'attachment height cannot be above the support height',
    path: ['attachHeightM'],
  });

export const siteHazardSchema = z
  .strictObject({
    id,
    kind: z.enum(HAZARD_KINDS, { message: `kind must be one of ${HAZARD_KINDS.join(', ')}` }),
    /** A line (power line, path, road) or, with three or more points and a closed kind, an outline. */
    points: z.array(latLon).min(1, 'mark at least one point').max(200, 'at most 200 points'),
    heightM: z.number().positive('height must be above 0').max(200, 'no line here is higher than 200 m').optional(),
    /** Nominal phase-to-phase voltage of a power line; missing means it is planned as a transmission line. */
    voltageKv: z.number().positive('voltage must be above 0').max(1200).optional(),
  })
  .refine((h) => h.kind !== 'power-line' || h.points.length >= 2, {
    message: 'a power line needs at least two points',
    path: ['points'],
  })
  .refine((h) => h.kind === 'power-line' || h.voltageKv === undefined, {
    message: 'only a power line has a voltage',
    path: ['voltageKv'],
  });

export const siteOperatingPositionSchema = z.strictObject({ id, lat: latSchema, lon: lonSchema });

export const siteStationSchema = z.strictObject({
  id,
  bands: z
    .array(z.enum(BAND_NAMES, { message: `band must be one of ${BAND_NAMES.join(', ')}` }))
    .min(1, 'pick at least one band')
    .max(BAND_NAMES.length),
  /** Peak envelope power at the transmitter. */
  powerW: z.number().positive('power must be above 0').max(1500, 'US amateur limit is 1500 W PEP (47 CFR 97.313)'),
  mode: z.enum(MODES, { message: `mode must be one of ${MODES.join(', ')}` }),
  /** What the station works; default by band (planner: DEFAULT_PURPOSE_BY_BAND). */
  purpose: z.enum(PURPOSES, { message: `purpose must be one of ${PURPOSES.join(', ')}` }).optional(),
});

export const siteCoaxSchema = z.strictObject({
  id,
  type: z.enum(COAX_TYPES, { message: `type must be one of ${COAX_TYPES.join(', ')}` }),
  lengthM: z.number().positive('length must be above 0').max(300, 'a coax piece longer than 300 m is not plausible'),
});

function uniqueIds(list: { id: string }[], field: string, ctx: z.RefinementCtx): void {
  const seen = new Map<string, number>();
  list.forEach((item, i) => {
    const first = seen.get(item.id);
    if (first !== undefined) {
      ctx.addIssue({ code: 'custom', path: [field, i, 'id'], message: `duplicate id "${item.id}" (also ${field}[${first}])` });
    } else seen.set(item.id, i);
  });
}

export const siteFileSchema = z
  .strictObject({
    version: z.literal(SITE_FILE_VERSION, { message: `version must be ${SITE_FILE_VERSION}` }),
    name: z.string().trim().max(120).optional(),
    /** Origin of the local east/north metres the planner works in. */
    reference: latLon,
    ground: siteGroundSchema,
    supports: z.array(siteSupportSchema).max(5000),
    hazards: z.array(siteHazardSchema).max(2000),
    operatingPositions: z.array(siteOperatingPositionSchema).max(200),
    stations: z.array(siteStationSchema).max(40),
    coax: z.array(siteCoaxSchema).max(500),
  })
  .superRefine((f, ctx) => {
    uniqueIds(f.supports, 'supports', ctx);
    uniqueIds(f.hazards, 'hazards', ctx);
    uniqueIds(f.operatingPositions, 'operatingPositions', ctx);
    uniqueIds(f.stations, 'stations', ctx);
    uniqueIds(f.coax, 'coax', ctx);
  });

export type SiteFile = z.infer<typeof siteFileSchema>;
export type SiteSupport = SiteFile['supports'][number];
export type SiteHazard = SiteFile['hazards'][number];
export type SiteStation = SiteFile['stations'][number];
export type SiteCoax = SiteFile['coax'][number];
export type SiteOperatingPosition = SiteFile['operatingPositions'][number];
export type SiteGround = SiteFile['ground'];

/** `supports[3].heightM` from a zod path. */
export function formatIssuePath(path: readonly PropertyKey[]): string {
  let out = '';
  for (const part of path) {
    if (typeof part === 'number') out += `[${part}]`;
    else out += out ? `.${String(part)}` : String(part);
  }
  return out || '(file)';
}

/** One "field path: message" line per problem; unknown fields are named one per line. */
export function formatZodIssues(error: z.ZodError): string[] {
  const lines: string[] = [];
  for (const issue of error.issues) {
    if (issue.code === 'unrecognized_keys') {
      for (const key of issue.keys) lines.push(`${formatIssuePath([...issue.path, key])}: unknown field`);
    } else {
      lines.push(`${formatIssuePath(issue.path)}: ${issue.message}`);
    }
  }
  return lines;
}

export type SiteFileParse = { ok: true; site: SiteFile } | { ok: false; errors: string[] };

/** Parse untrusted JSON text or a value into a site file, or the list of "path: message" problems. */
export function parseSiteFile(input: unknown): SiteFileParse {
  let value = input;
  if (typeof input === 'string') {
    try {
      value = JSON.parse(input);
    } catch (err) {
      return { ok: false, errors: [`(file): not valid JSON (${err instanceof Error ? err.message : String(err)})`] };
    }
  }
  const result = siteFileSchema.safeParse(value);
  return result.success ? { ok: true, site: result.data } : { ok: false, errors: formatZodIssues(result.error) };
}
