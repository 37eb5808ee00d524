// The review of an event's spots (evaluateEventSpots: records → site file → each spot's full checks → state), the
// work the review queue, the plan's assignment list and the crew sheets redo on every change, and the server redoes
// for each arriving decision. Generated parks of 50 and 200 supports, the engine's own assignment as the spots.
// CPU time of this process is the figure (the machine is shared); wall time beside it. Prints, asserts nothing.
import { performance } from 'node:perf_hooks';
import { generateDemoSite, planSite, seededRandom } from '../../shared/plan';
import { evaluateEventSpots } from '../../shared/review';
import type { AntennaSpot, Hazard, Site, Station, Support } from '../../shared/schemas';

const T = '2026-12-01T00:00:00.000Z';
const CLUB = '00000000-0000-4000-8000-00000000c1b0';
const meta = (id: string) => ({ id, clubId: CLUB, createdAt: T, updatedAt: T, deletedAt: null });

function recordsOf(n: number) {
  const file = generateDemoSite({ supports: n, random: seededRandom(7) });
  const plan = planSite(file);
  const site: Site = { ...meta('00000000-0000-4000-8000-000000000001'), name: file.name ?? 'Generated park', refLat: file.reference.lat, refLon: file.reference.lon, notes: '', groundDescription: '', groundClass: typeof file.ground === 'string' ? file.ground : 'average', groundSigmaSPerM: null, groundEpsR: null, accessNotes: '', rules: '' };
  const supports: Support[] = file.supports.map((s) => ({ ...meta(s.id), siteId: site.id, kind: s.kind, label: s.id, lat: s.lat, lon: s.lon, positionAccuracyM: 3, heightM: s.heightM, attachHeightM: s.attachHeightM ?? null, launchMethod: null, maxEnds: s.maxEnds ?? 2, species: '', condition: '', mastModel: '', notes: '' }));
  const hazards: Hazard[] = file.hazards.map((h) => ({ ...meta(h.id), siteId: site.id, kind: h.kind, label: h.id, points: h.points, isArea: false, heightM: h.heightM ?? null, voltageClass: h.kind === 'power-line' ? 'distribution' : null, voltageKv: h.voltageKv ?? null, notes: '' }));
  const stations: Station[] = file.stations.map((s) => ({ ...meta(s.id), eventId: site.id, name: s.id, bands: s.bands, mode: s.mode, powerW: s.powerW, purpose: s.purpose ?? 'regional', crewMemberIds: [], notes: '' }));
  const spots: AntennaSpot[] = plan.assignment.spots.filter((s) => s.candidate).map((s, i) => ({
    ...meta(`00000000-0000-4000-8000-${String(100 + i).padStart(12, '0')}`), eventId: site.id, stationId: s.stationId, band: s.band, shape: s.candidate!.shape, supportIds: s.candidate!.supportIds, legAzimuthDeg: null, coaxId: null, operatingPositionId: null, state: 'waiting-review', stateReason: '', inputsFingerprint: '', measuredSwr: null, notes: '',
  }));
  return { records: { site, supports, hazards, operatingPositions: file.operatingPositions.map((o) => ({ ...meta(o.id), siteId: site.id, label: o.id, lat: o.lat, lon: o.lon, notes: '' })), stations, coax: [] }, spots };
}

export async function run(): Promise<void> {
  for (const n of [50, 200]) {
    const { records, spots } = recordsOf(n);
    evaluateEventSpots(records, spots, []);
    const cpu: number[] = [];
    const wall: number[] = [];
    for (let i = 0; i < 5; i++) {
      const c0 = process.cpuUsage();
      const t0 = performance.now();
      evaluateEventSpots(records, spots, []);
      const c = process.cpuUsage(c0);
      cpu.push((c.user + c.system) / 1000);
      wall.push(performance.now() - t0);
    }
    cpu.sort((a, b) => a - b);
    wall.sort((a, b) => a - b);
    console.log(`review of ${spots.length} spots on a park of ${n} supports: median CPU ${cpu[2].toFixed(1)} ms (wall ${wall[2].toFixed(1)} ms) per full re-review, ${(cpu[2] / spots.length).toFixed(1)} ms per spot`);
  }
}
