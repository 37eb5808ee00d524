import type { Coax, Hazard, OperatingPosition, Site, Station, Support } from '../schemas/records';
import { type SiteFile, SITE_FILE_VERSION, siteFileSchema } from '../schemas/site-file';

/*
 * Turns what the scouts and the lead recorded (the synced records) into the site file the planning engine
 * reads. Records that cannot be planned yet are left out and said so, never guessed at: a support with
 * no height cannot have its fall checked, so it carries no wire until someone measures it.
 */

/**
 * Planning voltage for a power line whose kV nobody recorded, by the class the scout chose.
 * Service drops run 120/240 V; distribution primaries 4–35 kV (T. A. Short, Electric Power Distribution
 * Handbook, REFERENCES.md) — 35 kV is taken so the clearance is the one for the top of that range.
 * Transmission and unknown lines get no voltage, which the engine plans as transmission.
 */
export const PLANNING_KV_BY_CLASS = { 'service-drop': 0.24, distribution: 35 } as const;

export type SiteRecords = {
  site: Site;
  supports: readonly Support[];
  hazards: readonly Hazard[];
  operatingPositions: readonly OperatingPosition[];
  stations: readonly Station[];
  coax: readonly Coax[];
};

export type SiteFileBuild = {
  file: SiteFile;
  /** Plain lines: what was left out or assumed, for the lead to see beside the plan. */
  notes: string[];
};

/** The ground the planner uses when the scouts recorded none (said in the notes). */
export const UNRECORDED_GROUND = 'average';

function live<T extends { deletedAt: string | null }>(list: readonly T[]): T[] {
  return list.filter((r) => r.deletedAt === null);
}

export function siteFileFromRecords(records: SiteRecords): SiteFileBuild {
  const { site } = records;
  const notes: string[] = [];

  let ground: SiteFile['ground'];
  if (site.groundSigmaSPerM !== null && site.groundEpsR !== null) {
    ground = { sigmaSPerM: site.groundSigmaSPerM, epsR: site.groundEpsR };
  } else if (site.groundClass) {
    // The class name is checked against shared/ground when the file is parsed below.
    ground = site.groundClass as SiteFile['ground'];
  } else {
    ground = UNRECORDED_GROUND;
    notes.push('No ground recorded for this site yet: patterns are computed over average ground.');
  }

  const supports: SiteFile['supports'] = [];
  for (const s of live(records.supports)) {
    if (s.heightM === null) {
      notes.push(`${s.label} is left out: it has no height yet, so its fall zone cannot be checked.`);
      continue;
    }
    const attach = s.attachHeightM !== null ? Math.min(s.attachHeightM, s.heightM) : undefined;
    if (s.attachHeightM !== null && s.attachHeightM > s.heightM) {
      notes.push(`${s.label}: the attachment height is above the support's height; the support's height is used.`);
    }
    supports.push({ id: s.id, kind: s.kind, lat: s.lat, lon: s.lon, heightM: s.heightM, attachHeightM: attach, maxEnds: s.maxEnds });
  }

  const hazards: SiteFile['hazards'] = [];
  for (const h of live(records.hazards)) {
    const voltageKv =
      h.kind !== 'power-line'
        ? undefined
        : (h.voltageKv ??
          (h.voltageClass === 'service-drop' || h.voltageClass === 'distribution' ? PLANNING_KV_BY_CLASS[h.voltageClass] : undefined));
    if (h.kind === 'power-line' && h.voltageKv === null) {
      notes.push(
        voltageKv === undefined
          ? `${h.label}: voltage not known, planned as a transmission line.`
          : `${h.label}: voltage not recorded, planned at ${voltageKv} kV for a ${h.voltageClass === 'service-drop' ? 'service drop' : 'distribution line'}.`,
      );
    }
    hazards.push({
      id: h.id,
      kind: h.kind,
      points: h.points.map((p) => ({ lat: p.lat, lon: p.lon })),
      heightM: h.heightM ?? undefined,
      voltageKv,
    });
  }

  const file: SiteFile = {
    version: SITE_FILE_VERSION,
    name: site.name,
    reference: { lat: site.refLat, lon: site.refLon },
    ground,
    supports,
    hazards,
    operatingPositions: live(records.operatingPositions).map((o) => ({ id: o.id, lat: o.lat, lon: o.lon })),
    stations: live(records.stations).map((s) => ({ id: s.id, bands: [...s.bands], powerW: s.powerW, mode: s.mode, purpose: s.purpose })),
    coax: live(records.coax).map((c) => ({ id: c.id, type: c.type, lengthM: c.lengthM })),
  };
  // The records were validated when written; this catches a record schema and the site file drifting apart.
  return { file: siteFileSchema.parse(file), notes };
}
