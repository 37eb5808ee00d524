import type { CollectionName } from '@/shared/schemas';

/*
 * The words of the sync-problems screen, from the entries and the local records (pure, so it is tested without
 * rendering). A conflict is told as "Tree 4 height: kept 14 m (Ana, 10:02); also recorded 11 m (Ben, 10:01)":
 * "kept" is only what the merge kept (the later clock), never "correct".
 */

export type FormatLength = (m: number | null | undefined) => string;

const NOUN: Record<CollectionName, string> = {
  sites: 'site',
  events: 'event',
  supports: 'support',
  measurements: 'reading',
  hazards: 'hazard',
  operatingPositions: 'operating position',
  photos: 'photo',
  stations: 'station',
  coax: 'coax reel',
  antennaSpots: 'antenna spot',
  reviewDecisions: 'review decision',
};

export const collectionNoun = (c: CollectionName): string => NOUN[c];

const FIELD_WORDS: Record<string, string> = {
  heightM: 'height',
  attachHeightM: 'attachment height',
  lat: 'latitude',
  lon: 'longitude',
  maxEnds: 'wire ends it can carry',
  points: 'line points',
  voltageClass: 'voltage class',
  voltageKv: 'voltage',
  kind: 'kind',
  groundClass: 'ground class',
  groundSigmaSPerM: 'ground conductivity',
  groundEpsR: 'ground permittivity',
  powerW: 'power',
  lengthM: 'length',
  azimuthDeg: 'bearing',
  legAzimuthDeg: 'leg bearing',
};

/** A field in plain words; a power line's height is the wire's height above ground, not a support's. */
export function fieldWords(collection: CollectionName, field: string): string {
  if (collection === 'hazards' && field === 'heightM') return 'wire height';
  // Unknown fields: drop the unit suffix of the name ("swrMeasured", "spanM" → "span") and split the words.
  return FIELD_WORDS[field] ?? field.replace(/(?<=[a-z])(M|W|Deg|Mhz|Kv|Dbi)$/, '').replace(/([A-Z])/g, ' $1').toLowerCase();
}

const LENGTH_FIELDS = new Set(['heightM', 'attachHeightM', 'positionAccuracyM', 'lengthM']);

/** One field value as a person reads it, lengths in the user's units. */
export function valueWords(field: string, value: unknown, formatLengthM: FormatLength): string {
  if (value === null || value === undefined || value === '') return 'nothing recorded';
  if (LENGTH_FIELDS.has(field) && typeof value === 'number') return formatLengthM(value);
  if ((field === 'lat' || field === 'lon') && typeof value === 'number') return `${value.toFixed(6)}°`;
  if (field === 'voltageKv' && typeof value === 'number') return `${value} kV`;
  if (field === 'powerW' && typeof value === 'number') return `${value} W`;
  if (/Deg$/.test(field) && typeof value === 'number') return `${value}°`;
  if (field === 'groundSigmaSPerM' && typeof value === 'number') return `${value} S/m`;
  if (field === 'groundEpsR' && typeof value === 'number') return `relative permittivity ${value}`;
  if (field === 'points' && Array.isArray(value)) {
    const first = value[0] as { lat?: number; lon?: number } | undefined;
    const start = first && typeof first.lat === 'number' && typeof first.lon === 'number' ? ` from ${first.lat.toFixed(5)}°, ${first.lon.toFixed(5)}°` : '';
    return `${value.length} point${value.length === 1 ? '' : 's'}${start}`;
  }
  if (Array.isArray(value)) return value.map((v) => valueWords('', v, formatLengthM)).join(', ');
  if (typeof value === 'object') return JSON.stringify(value);
  if (typeof value === 'boolean') return value ? 'yes' : 'no';
  return String(value);
}

/** Wall time of a sync clock ("0001764669720000-0000-node") as hours and minutes, with the date if not today. */
export function clockWords(wallMs: number, nowMs: number, withSeconds = false): string {
  const t = new Date(wallMs);
  const hm = t.toLocaleTimeString([], { hour: '2-digit', minute: '2-digit', ...(withSeconds ? { second: '2-digit' } : {}) });
  return new Date(nowMs).toDateString() === t.toDateString() ? hm : `${t.toLocaleDateString([], { month: 'short', day: 'numeric' })} ${hm}`;
}

/** The label a person gave the record, or what it is when this device does not hold it. */
export function recordWords(collection: CollectionName, record: Record<string, unknown> | null | undefined, fallbackFields?: Record<string, unknown>): string {
  const named = (r: Record<string, unknown> | null | undefined) => (r && typeof r.label === 'string' && r.label) || (r && typeof r.name === 'string' && r.name) || null;
  const name = named(record) ?? named(fallbackFields);
  if (name) return name;
  return `a ${NOUN[collection]} not on this device`;
}

export interface ConflictSide {
  value: unknown;
  who: string;
  wallMs: number;
}

/** "Tree 4 height: kept 14 m (Ana Scout, 10:02); also recorded 11 m (Ben Scout, 10:01)". */
export function conflictSentence(a: { record: string; collection: CollectionName; field: string; kept: ConflictSide; other: ConflictSide; nowMs: number; formatLengthM: FormatLength }): string {
  // Two values recorded within the same minute would read as the same time: then the seconds tell them apart.
  const sameMinute = Math.floor(a.kept.wallMs / 60_000) === Math.floor(a.other.wallMs / 60_000);
  const side = (s: ConflictSide) => `${valueWords(a.field, s.value, a.formatLengthM)} (${s.who}, ${clockWords(s.wallMs, a.nowMs, sameMinute)})`;
  return `${a.record} ${fieldWords(a.collection, a.field)}: kept ${side(a.kept)}; also recorded ${side(a.other)}`;
}

/** Fields whose disagreement is about clearance from a power line or what a mast or tree can hold. */
export function isHeightOrLineConflict(collection: CollectionName, field: string): boolean {
  return collection === 'hazards' || field === 'heightM' || field === 'attachHeightM';
}

export const CONFLICT_CAUTION =
  'Both values must be checked on site before anything goes up. The kept value is only the one recorded later, not the correct one.';
/** A server message as a sentence ("your role …" → "Your role …"). */
export const sentenceCase = (text: string): string => (text ? text[0]!.toUpperCase() + text.slice(1) : text);

export const LINE_CAUTION = 'Treat every power line as energised. These are planning estimates; the utility, local codes and licensed practice decide.';

const OPS: Record<string, string> = { upsert: 'change', delete: 'removal', undelete: 'restore' };

/** What was refused, in a line: "change of station “Station 1”: name Station 1 · bands 40m · power W 100". */
export function refusedWords(a: { collection: CollectionName; op: string; record: string; fields: Record<string, unknown>; formatLengthM: FormatLength }): string {
  // The name first (the server's JSON does not keep the order the fields were written in), ids left out.
  const first = (k: string) => (k === 'label' || k === 'name' || k === 'kind' ? 0 : 1);
  const parts = Object.entries(a.fields)
    .filter(([k]) => k !== 'siteId' && k !== 'eventId')
    .sort(([x], [y]) => first(x) - first(y))
    .slice(0, 6)
    .map(([k, v]) => `${fieldWords(a.collection, k)} ${valueWords(k, v, a.formatLengthM)}`);
  const more = Object.keys(a.fields).length > parts.length + (a.fields.siteId ? 1 : 0) + (a.fields.eventId ? 1 : 0) ? ' · …' : '';
  return `${OPS[a.op] ?? a.op} of ${NOUN[a.collection]} “${a.record}”${parts.length ? `: ${parts.join(' · ')}${more}` : ''}`;
}
