// The invented demo scenario: a club, its five members (one per role), a park, a field-day outing, the park's
// supports, a power line, a path, a car park and two operating positions. Everything here is made up: the club,
// its call sign, the park, the people. Positions are given in metres east/north of the park's reference point.
import type { CollectionFields, Role } from '../../../shared/schemas';

export const DEMO_PASSWORD = 'loftline-demo';
export const DEMO_CLUB = { name: 'Kestrel Ridge Amateur Radio Club', callSign: 'K0KRC' };

export const DEMO_USERS: { email: string; displayName: string; role: Role }[] = [
  { email: 'admin@kestrel.test', displayName: 'Dana Whitlock', role: 'admin' },
  { email: 'lead@kestrel.test', displayName: 'Priya Raman', role: 'lead' },
  { email: 'safety@kestrel.test', displayName: 'Tomas Ekberg', role: 'safety' },
  { email: 'scout@kestrel.test', displayName: 'June Okafor', role: 'scout' },
  { email: 'crew@kestrel.test', displayName: 'Ray Castellano', role: 'crew' },
];

/** A rural spot on the plains (an invented park; no real site is described). */
export const DEMO_REF = { lat: 38.90625, lon: -97.64183 };

type Offset = { e: number; n: number };

export const DEMO_SITE: Omit<CollectionFields<'sites'>, 'refLat' | 'refLon'> = {
  name: 'Alder Bend Meadows',
  notes: 'Mown meadow inside a bend of Alder Creek, about 250 m across. Trees line the creek on the west and north sides.',
  groundDescription: 'Mown meadow on clay loam; damp near the creek, firm elsewhere',
  groundClass: 'average',
  groundSigmaSPerM: null,
  groundEpsR: null,
  accessNotes: 'Enter by the south gate from the county road. The car park is gravel; the meadow takes cars only when dry.',
  rules: 'No stakes within 3 m of the mown footpath\nNo lines thrown over the county road or the power line\nPack out everything by 20:00 on the last day',
};

export interface DemoSupport {
  key: string;
  at: Offset;
  fields: Omit<CollectionFields<'supports'>, 'siteId' | 'lat' | 'lon'>;
}

const tree = (key: string, label: string, species: string, heightM: number, attachHeightM: number, launch: CollectionFields<'supports'>['launchMethod'], at: Offset, condition: string, notes = ''): DemoSupport => ({
  key,
  at,
  fields: { kind: 'tree', label, species, heightM, attachHeightM, launchMethod: launch, positionAccuracyM: 4, maxEnds: 2, condition, mastModel: '', notes },
});

export const DEMO_SUPPORTS: DemoSupport[] = [
  tree('t1', 'Big bur oak', 'bur oak', 21, 17, 'throw-bag', { e: -60, n: 40 }, 'Sound; wide crown with a clear fork on the east side'),
  tree('t2', 'Cottonwood pair', 'eastern cottonwood', 26, 20, 'pneumatic', { e: 10, n: 72 }, 'Tall and open; some dead limbs high on the north tree'),
  tree('t3', 'Lone hackberry', 'hackberry', 14, 11, 'throw-bag', { e: 55, n: 35 }, 'Healthy, dense lower branches'),
  tree('t4', 'Creek sycamore', 'American sycamore', 24, 18, 'slingshot', { e: -78, n: -28 }, 'Leans slightly over the creek'),
  tree('t5', 'Gate walnut', 'black walnut', 17, 13, 'throw-bag', { e: 40, n: -55 }, 'Good crotch at about 13 m'),
  tree('t6', 'Red cedar pair', 'eastern red cedar', 9, 7, 'hand-throw', { e: -22, n: -62 }, 'Dense; only the tops are reachable'),
  tree('t7', 'Honey locust', 'honey locust', 15, 12, 'throw-bag', { e: 88, n: 8 }, 'Thorny trunk: wear gloves'),
  tree('t8', 'Ash at the bend', 'green ash', 19, 15, 'slingshot', { e: -35, n: 86 }, 'Some ash dieback; check limbs before loading'),
  // The road edge is tempting (the tallest open tree near the north-east corner), so the scout recorded it; it
  // stands about 8 m from the distribution line, so the planning engine must block any wire on it.
  tree('t9', 'Roadside elm', 'American elm', 16, 12, 'throw-bag', { e: 126, n: 55 }, 'Healthy; open crown over the road verge',
    'Beside the county road power line, about 8 m from the conductors between the second and third poles. Recorded so nobody plans on it by mistake.'),
  {
    key: 'm1',
    at: { e: -5, n: 12 },
    fields: { kind: 'mast', label: 'Centre mast spot', species: '', heightM: 12, attachHeightM: 11.5, launchMethod: 'none', positionAccuracyM: 3, maxEnds: 2, condition: 'Level, firm turf; room for three guy stakes at 6 m', mastModel: '12 m telescopic fibreglass mast, guyed at two levels', notes: '' },
  },
  {
    key: 'm2',
    at: { e: 62, n: -12 },
    fields: { kind: 'mast', label: 'East mast spot', species: '', heightM: 9, attachHeightM: 8.7, launchMethod: 'none', positionAccuracyM: 3, maxEnds: 1, condition: 'Level; soft after rain', mastModel: '9 m push-up aluminium mast with one top pulley', notes: '' },
  },
];

export interface DemoHazard {
  key: string;
  points: Offset[];
  fields: Omit<CollectionFields<'hazards'>, 'siteId' | 'points'>;
}

export const DEMO_HAZARDS: DemoHazard[] = [
  {
    key: 'power',
    // Crosses the north-east corner of the meadow along the county road.
    points: [{ e: 72, n: 118 }, { e: 112, n: 80 }, { e: 152, n: 42 }],
    fields: {
      kind: 'power-line', label: 'County road distribution line', isArea: false, heightM: 9.5, voltageClass: 'distribution', voltageKv: 12.47,
      notes: 'Three-phase 12.47 kV on wooden poles. Conductor height estimated from the ground, not measured. Treat as energised at all times.',
    },
  },
  {
    key: 'path',
    points: [{ e: -110, n: -8 }, { e: -10, n: -22 }, { e: 70, n: -35 }, { e: 130, n: -30 }],
    fields: { kind: 'path', label: 'Mown footpath', isArea: false, heightM: null, voltageClass: null, voltageKv: null, notes: 'Public footpath: walkers and dogs all day' },
  },
  {
    key: 'parking',
    points: [{ e: 60, n: -95 }, { e: 115, n: -95 }, { e: 115, n: -65 }, { e: 60, n: -65 }],
    fields: { kind: 'parking', label: 'Gravel car park', isArea: true, heightM: null, voltageClass: null, voltageKv: null, notes: 'About 20 cars; shared with park visitors' },
  },
];

export const DEMO_POSITIONS: { key: string; at: Offset; fields: Omit<CollectionFields<'operatingPositions'>, 'siteId' | 'lat' | 'lon'> }[] = [
  { key: 'op1', at: { e: -15, n: -4 }, fields: { label: 'Canopy A', notes: 'Generator 20 m downwind to the south-west' } },
  { key: 'op2', at: { e: 24, n: -14 }, fields: { label: 'Canopy B', notes: 'Shares the battery bank with Canopy A' } },
];

/**
 * The crew of each station by e-mail (seed-demo turns them into user ids): Station 2 names the demo crew member, and
 * Station 1 names no one, so the demo shows both ways a "sheet ready" e-mail goes out (own crew; every crew member).
 */
export const DEMO_STATIONS: { key: string; crewEmails: string[]; fields: Omit<CollectionFields<'stations'>, 'eventId' | 'crewMemberIds'> }[] = [
  { key: 's1', crewEmails: [], fields: { name: 'Station 1 (low bands)', bands: ['80m', '40m'], mode: 'ssb', powerW: 100, purpose: 'regional', notes: '' } },
  { key: 's2', crewEmails: ['crew@kestrel.test'], fields: { name: 'Station 2 (high bands)', bands: ['20m', '15m', '10m'], mode: 'cw', powerW: 100, purpose: 'long-distance', notes: '' } },
];

export const DEMO_COAX: { key: string; fields: CollectionFields<'coax'> }[] = [
  { key: 'c1', fields: { label: 'Reel A', type: 'RG-213', lengthM: 30, notes: '' } },
  { key: 'c2', fields: { label: 'Reel B', type: 'RG-8X', lengthM: 25, notes: '' } },
  { key: 'c3', fields: { label: 'Jumper bag', type: 'LMR-400', lengthM: 15, notes: '' } },
  // Enough reels for every antenna the demo plan chooses (its spots need runs of about 35–95 m): with only the
  // three above, the demo plan told four of five antennas to "bring more" coax.
  { key: 'c4', fields: { label: 'Reel C', type: 'RG-213', lengthM: 60, notes: '' } },
  { key: 'c5', fields: { label: 'Reel D', type: 'RG-213', lengthM: 50, notes: '' } },
  { key: 'c6', fields: { label: 'Reel E', type: 'RG-213', lengthM: 45, notes: '' } },
  { key: 'c7', fields: { label: 'Reel F', type: 'RG-8X', lengthM: 30, notes: 'Light reel for the high bands' } },
  { key: 'c8', fields: { label: 'Reel G', type: 'RG-213', lengthM: 60, notes: '' } },
  { key: 'c9', fields: { label: 'Long reel', type: 'RG-213', lengthM: 75, notes: 'Heavy: two people to carry' } },
];

export const DEMO_EVENT_NAME = 'Midwinter Field Outing';

/** First Saturday at least three weeks after `today`, for two days: always an upcoming outing on first start. */
export function demoEventDays(today: Date): { startsOn: string; endsOn: string } {
  const start = new Date(Date.UTC(today.getUTCFullYear(), today.getUTCMonth(), today.getUTCDate() + 21));
  start.setUTCDate(start.getUTCDate() + ((6 - start.getUTCDay() + 7) % 7));
  const end = new Date(start.getTime() + 24 * 3600_000);
  return { startsOn: start.toISOString().slice(0, 10), endsOn: end.toISOString().slice(0, 10) };
}

const M_PER_DEG_LAT = 111_320;
/** Offset in metres → lat/lon near the reference point (flat-earth step; ample over a few hundred metres). */
export function offsetToLatLon(at: Offset, ref = DEMO_REF): { lat: number; lon: number } {
  const lat = ref.lat + at.n / M_PER_DEG_LAT;
  const lon = ref.lon + at.e / (M_PER_DEG_LAT * Math.cos((ref.lat * Math.PI) / 180));
  return { lat: Math.round(lat * 1e7) / 1e7, lon: Math.round(lon * 1e7) / 1e7 };
}
