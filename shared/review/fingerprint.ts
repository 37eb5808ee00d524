import type { Hazard, OperatingPosition, Site, Station, Support } from '../schemas/records';

/*
 * A spot's inputs fingerprint: what its clearances were computed from. A review decision stores the
 * fingerprint it was made against; when the supports, hazards or ground change, the fingerprint changes,
 * the old decisions no longer apply and the spot goes back to review, with the reason named.
 * Format: "v1.s<hash>.s<hash>.h<hash>.g<hash>[.l<hash>][.p<hash>][.o<hash>]" (one part per support of the
 * spot, in order, then all hazards of the site, then the ground, then an inverted-V's chosen leg bearing when it
 * has one, then the station's power and mode and the site's operating positions, which the RF-exposure check
 * uses), each hash 8 hex digits of FNV-1a 32 over canonical JSON. The leg part is left out when no bearing is
 * chosen, so spots reviewed before bearings were recorded keep their fingerprint and their decisions.
 */

function fnv1a32(text: string): string {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193) >>> 0;
  }
  return h.toString(16).padStart(8, '0');
}

/** JSON with object keys sorted, so the same content always gives the same text. */
function canonical(value: unknown): string {
  if (Array.isArray(value)) return `[${value.map(canonical).join(',')}]`;
  if (value && typeof value === 'object') {
    const entries = Object.entries(value as Record<string, unknown>)
      .filter(([, v]) => v !== undefined)
      .sort(([a], [b]) => (a < b ? -1 : a > b ? 1 : 0));
    return `{${entries.map(([k, v]) => `${JSON.stringify(k)}:${canonical(v)}`).join(',')}}`;
  }
  return JSON.stringify(value);
}

const supportPart = (s: Support | undefined) =>
  s && s.deletedAt === null
    ? { lat: s.lat, lon: s.lon, heightM: s.heightM, attachHeightM: s.attachHeightM, maxEnds: s.maxEnds, kind: s.kind }
    : { missing: true };

const hazardPart = (hazards: readonly Hazard[]) =>
  hazards
    .filter((h) => h.deletedAt === null)
    .map((h) => ({ id: h.id, kind: h.kind, points: h.points, heightM: h.heightM, voltageClass: h.voltageClass, voltageKv: h.voltageKv, isArea: h.isArea }))
    .sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));

const groundPart = (site: Site) => ({ c: site.groundClass, s: site.groundSigmaSPerM, e: site.groundEpsR });

const stationPart = (station: Pick<Station, 'powerW' | 'mode' | 'deletedAt'> | null) =>
  station && station.deletedAt === null ? { w: station.powerW, m: station.mode } : { missing: true };

const positionsPart = (positions: readonly OperatingPosition[]) =>
  positions
    .filter((o) => o.deletedAt === null)
    .map((o) => ({ id: o.id, lat: o.lat, lon: o.lon }))
    .sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));

export type FingerprintInputs = {
  site: Site;
  /** The spot's supports, in the spot's order (ids not found count as removed). */
  supportIds: readonly string[];
  supports: readonly Support[];
  hazards: readonly Hazard[];
  /** The inverted-V leg bearing the lead chose (antennaSpots.legAzimuthDeg); null or absent when none. */
  legAzimuthDeg?: number | null;
  /** The spot's station (power and mode set the RF-exposure distances); null when it was removed. */
  station?: Pick<Station, 'powerW' | 'mode' | 'deletedAt'> | null;
  /** The site's operating positions (the operators' exposure distance is checked to each). */
  operatingPositions?: readonly OperatingPosition[];
};

export function spotFingerprint(inputs: FingerprintInputs): string {
  const byId = new Map(inputs.supports.map((s) => [s.id, s]));
  const parts = inputs.supportIds.map((id) => `s${fnv1a32(canonical(supportPart(byId.get(id))))}`);
  parts.push(`h${fnv1a32(canonical(hazardPart(inputs.hazards)))}`);
  parts.push(`g${fnv1a32(canonical(groundPart(inputs.site)))}`);
  if (typeof inputs.legAzimuthDeg === 'number') parts.push(`l${fnv1a32(canonical({ legAzimuthDeg: inputs.legAzimuthDeg }))}`);
  if (inputs.station !== undefined) parts.push(`p${fnv1a32(canonical(stationPart(inputs.station)))}`);
  if (inputs.operatingPositions) parts.push(`o${fnv1a32(canonical(positionsPart(inputs.operatingPositions)))}`);
  return `v1.${parts.join('.')}`;
}

/** The parts of a fingerprint by kind: the support parts in order, and the single hazard, ground and leg parts. */
function partsOf(fingerprint: string) {
  const [version, ...rest] = fingerprint.split('.');
  return {
    version,
    supports: rest.filter((p) => p[0] === 's'),
    single: (tag: string) => rest.find((p) => p[0] === tag) ?? null,
  };
}

/**
 * Why two fingerprints of the same spot differ, in plain words (empty when they are the same).
 * `supportLabels` names the spot's supports in order.
 */
export function fingerprintChanges(before: string, after: string, supportLabels: readonly string[]): string[] {
  if (before === after) return [];
  const a = partsOf(before);
  const b = partsOf(after);
  if (a.version !== b.version || a.supports.length !== b.supports.length) return ['The spot was recomputed from different inputs since the review.'];
  const out: string[] = [];
  b.supports.forEach((part, i) => {
    if (part !== a.supports[i]) out.push(`${supportLabels[i] ?? 'A support'} changed since the review (position, height or ends).`);
  });
  if (a.single('h') !== b.single('h')) out.push('A hazard on the site (power line, path, road, parking, building or water) changed since the review.');
  if (a.single('g') !== b.single('g')) out.push('The ground recorded for the site changed since the review.');
  if (a.single('l') !== b.single('l')) out.push('The direction the inverted-V’s legs run changed since the review: the wire now hangs over different ground.');
  if (a.single('p') !== b.single('p')) {
    out.push(a.single('p') === null ? 'The review was made before the station’s power and mode were part of it: review the RF-exposure results again.' : 'The station’s power or mode changed since the review, so its RF-exposure distances changed.');
  }
  if (a.single('o') !== b.single('o') && a.single('o') !== null) out.push('An operating position was added, moved or removed since the review (the operators’ RF-exposure distance is checked to each).');
  return out;
}
