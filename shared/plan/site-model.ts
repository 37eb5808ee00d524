import { BANDS, type BandName, bandCentreMhz } from '../bands';
import type { PlanePoint, PlaneShape } from '../clearance/planar';
import type { RecordedHazard } from '../clearance/types';
import type { CoaxPiece } from '../coax/coax-run';
import { type Ground, customGround, groundFromClass } from '../ground';
import type { OperatorWindowId } from '../pattern';
import { DEFAULT_MAX_ENDS, type SiteFile } from '../schemas/site-file';
import { localPlanePoint, wavelengthAtM } from './physics';

export type ModelSupport = {
  id: string;
  kind: 'tree' | 'mast' | 'structure';
  at: PlanePoint;
  heightM: number;
  attachHeightM: number;
  maxEnds: number;
};

/** One antenna the plan must place: a station on one band (each band of a station gets its own dipole). */
export type AntennaNeed = {
  key: string;
  stationId: string;
  band: BandName;
  purpose: OperatorWindowId;
  purposeDefaulted: boolean;
  powerW: number;
  mode: SiteFile['stations'][number]['mode'];
  /** The dipole is cut for the band centre; exposure uses the band top (the strictest 1.1310 limit at HF). */
  freqMhz: number;
  highMhz: number;
  wavelengthM: number;
};

export type SiteModel = {
  ground: Ground;
  groundLabel: string;
  supports: ModelSupport[];
  hazards: RecordedHazard[];
  powerLines: RecordedHazard[];
  publicAreas: RecordedHazard[];
  operatingPositions: { id: string; at: PlanePoint }[];
  coax: CoaxPiece[];
  needs: AntennaNeed[];
};

/** What a station works when the file does not say (common practice for field-day HF). */
export const DEFAULT_PURPOSE_BY_BAND: Record<BandName, OperatorWindowId> = {
  '160m': 'near-vertical',
  '80m': 'near-vertical',
  '60m': 'near-vertical',
  '40m': 'regional',
  '30m': 'regional',
  '20m': 'long-distance',
  '17m': 'long-distance',
  '15m': 'long-distance',
  '12m': 'long-distance',
  '10m': 'long-distance',
  '6m': 'long-distance',
};

const CLOSED_KINDS = new Set(['parking', 'building', 'water']);
const PUBLIC_KINDS = new Set(['path', 'road', 'parking']);

/** Thrown for site files that pass the schema but cannot be planned (unknown ground class). */
export class PlanInputError extends Error {
  constructor(
    readonly field: string,
    message: string,
  ) {
    super(`${field}: ${message}`);
  }
}

function resolveGround(g: SiteFile['ground']): { ground: Ground; label: string } {
  if (typeof g === 'string') {
    try {
      return { ground: groundFromClass(g), label: g };
    } catch (err) {
      throw new PlanInputError('ground', err instanceof Error ? err.message : String(err));
    }
  }
  return { ground: customGround(g.sigmaSPerM, g.epsR), label: `σ ${g.sigmaSPerM} S/m, εr ${g.epsR}` };
}

/** The site file in the planner's terms: local east/north metres around the reference, defaults filled in. */
export function buildSiteModel(site: SiteFile): SiteModel {
  const ref = site.reference;
  const toPlane = (p: { lat: number; lon: number }) => localPlanePoint(ref, p);
  const { ground, label } = resolveGround(site.ground);
  const supports: ModelSupport[] = site.supports.map((s) => ({
    id: s.id,
    kind: s.kind,
    at: toPlane(s),
    heightM: s.heightM,
    attachHeightM: s.attachHeightM ?? s.heightM,
    maxEnds: s.maxEnds ?? DEFAULT_MAX_ENDS[s.kind],
  }));
  const hazards: RecordedHazard[] = site.hazards.map((h) => {
    const shape: PlaneShape = { points: h.points.map(toPlane), closed: CLOSED_KINDS.has(h.kind) && h.points.length >= 3 };
    return { id: h.id, kind: h.kind, shape, heightM: h.heightM, voltageKv: h.voltageKv };
  });
  const needs: AntennaNeed[] = [];
  for (const st of site.stations) {
    for (const band of st.bands) {
      const freqMhz = bandCentreMhz(band);
      needs.push({
        key: `${st.id}:${band}`,
        stationId: st.id,
        band,
        purpose: st.purpose ?? DEFAULT_PURPOSE_BY_BAND[band],
        purposeDefaulted: st.purpose === undefined,
        powerW: st.powerW,
        mode: st.mode,
        freqMhz,
        highMhz: BANDS[band].highMhz,
        wavelengthM: wavelengthAtM(freqMhz),
      });
    }
  }
  return {
    ground,
    groundLabel: label,
    supports,
    hazards,
    powerLines: hazards.filter((h) => h.kind === 'power-line'),
    publicAreas: hazards.filter((h) => PUBLIC_KINDS.has(h.kind)),
    operatingPositions: site.operatingPositions.map((o) => ({ id: o.id, at: toPlane(o) })),
    coax: site.coax.map((c) => ({ id: c.id, type: c.type, lengthM: c.lengthM })),
    needs,
  };
}
