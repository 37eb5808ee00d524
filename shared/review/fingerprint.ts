import type { Hazard, Site, Support } from '../schemas/records';

/*
 * A spot's inputs fingerprint: what its clearances were computed from. A review decision stores the
 * fingerprint it was made against; when the supports, hazards or ground change, the fingerprint changes,
 * the old decisions no longer apply and the spot goes back to review, with the reason named.
 * Format: "v1.s<hash>.s<hash>.h<hash>.g<hash>" (one part per support of the spot, in order, then all
 * hazards of the site, then the ground), each hash 8 hex digits of FNV-1a 32 over canonical JSON.
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

export type FingerprintInputs = {
  site: Site;
  /** The spot's supports, in the spot's order (ids not found count as removed). */
  supportIds: readonly string[];
  supports: readonly Support[];
  hazards: readonly Hazard[];
};

export function spotFingerprint(inputs: FingerprintInputs): string {
  const byId = new Map(inputs.supports.map((s) => [s.id, s]));
  const parts = inputs.supportIds.map((id) => `s${fnv1a32(canonical(supportPart(byId.get(id))))}`);
  parts.push(`h${fnv1a32(canonical(hazardPart(inputs.hazards)))}`);
  parts.push(`g${fnv1a32(canonical(groundPart(inputs.site)))}`);
  return `v1.${parts.join('.')}`;
}

/**
 * Why two fingerprints of the same spot differ, in plain words (empty when they are the same).
 * `supportLabels` names the spot's supports in order.
 */
export function fingerprintChanges(before: string, after: string, supportLabels: readonly string[]): string[] {
  if (before === after) return [];
  const a = before.split('.');
  const b = after.split('.');
  if (a[0] !== b[0] || a.length !== b.length) return ['The spot was recomputed from different inputs since the review.'];
  const out: string[] = [];
  for (let i = 1; i < a.length; i++) {
    if (a[i] === b[i]) continue;
    const tag = b[i][0];
    if (tag === 's') out.push(`${supportLabels[i - 1] ?? 'A support'} changed since the review (position, height or ends).`);
    else if (tag === 'h') out.push('A hazard on the site (power line, path, road, parking, building or water) changed since the review.');
    else if (tag === 'g') out.push('The ground recorded for the site changed since the review.');
  }
  return out;
}
