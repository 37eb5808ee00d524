import { describe, expect, test } from 'vitest';
import type { Hazard, ReviewDecision, Site, Support } from '../schemas/records';
import { fingerprintChanges, reviewSpot, decisionProblem, siteFileFromRecords, spotFingerprint } from './index';

const T = '2026-12-01T10:00:00.000Z';
const meta = (id: string) => ({ id, clubId: 'c0000000-0000-4000-8000-000000000000', createdAt: T, updatedAt: T, deletedAt: null });
const uuid = (n: number) => `00000000-0000-4000-8000-${String(n).padStart(12, '0')}`;

const site: Site = {
  ...meta(uuid(1)),
  name: 'Test meadow',
  refLat: 45,
  refLon: -93,
  notes: '',
  groundDescription: '',
  groundClass: 'average',
  groundSigmaSPerM: null,
  groundEpsR: null,
  accessNotes: '',
  rules: '',
};
const support = (n: number, over: Partial<Support> = {}): Support => ({
  ...meta(uuid(n)),
  siteId: site.id,
  kind: 'tree',
  label: `Oak ${n}`,
  lat: 45 + n * 1e-4,
  lon: -93,
  positionAccuracyM: 3,
  heightM: 18,
  attachHeightM: 14,
  launchMethod: 'throw-bag',
  maxEnds: 2,
  species: '',
  condition: '',
  mastModel: '',
  notes: '',
  ...over,
});
const line: Hazard = {
  ...meta(uuid(50)),
  siteId: site.id,
  kind: 'power-line',
  label: 'Road line',
  points: [
    { lat: 45.001, lon: -93.001 },
    { lat: 45.001, lon: -92.999 },
  ],
  isArea: false,
  heightM: 9,
  voltageClass: 'distribution',
  voltageKv: null,
  notes: '',
};
const decision = (key: string, d: 'accept' | 'send-back', fp: string, at = T, n = 90): ReviewDecision => ({
  ...meta(uuid(n)),
  spotId: uuid(70),
  resultKey: key,
  decision: d,
  reason: 'Roped off with flags, checked on site',
  inputsFingerprint: fp,
  decidedAt: at,
  decidedBy: uuid(99),
});

describe('records → site file', () => {
  test('a support with no height is left out and said so; a distribution line with no kV is planned at 35 kV (top of the 4–35 kV distribution range, Short, Electric Power Distribution Handbook)', () => {
    const { file, notes } = siteFileFromRecords({
      site,
      supports: [support(2), support(3, { heightM: null })],
      hazards: [line],
      operatingPositions: [],
      stations: [],
      coax: [],
    });
    expect(file.supports.map((s) => s.id)).toEqual([uuid(2)]);
    expect(file.hazards[0].voltageKv).toBe(35);
    expect(notes.join(' ')).toMatch(/Oak 3 is left out/);
    expect(notes.join(' ')).toMatch(/35 kV/);
  });

  test('an unknown-voltage line carries no voltage, so the engine plans it as transmission (issue 4 rule)', () => {
    const { file, notes } = siteFileFromRecords({
      site: { ...site, groundClass: null },
      supports: [],
      hazards: [{ ...line, voltageClass: 'unknown' }],
      operatingPositions: [],
      stations: [],
      coax: [],
    });
    expect(file.hazards[0].voltageKv).toBeUndefined();
    expect(file.ground).toBe('average');
    expect(notes.join(' ')).toMatch(/transmission/);
    expect(notes.join(' ')).toMatch(/No ground recorded/);
  });

  test('deleted records are not planned', () => {
    const { file } = siteFileFromRecords({
      site,
      supports: [support(2, { deletedAt: T })],
      hazards: [{ ...line, deletedAt: T }],
      operatingPositions: [],
      stations: [],
      coax: [],
    });
    expect(file.supports).toHaveLength(0);
    expect(file.hazards).toHaveLength(0);
  });
});

describe('inputs fingerprint', () => {
  const base = { site, supportIds: [uuid(2), uuid(3)], supports: [support(2), support(3)], hazards: [line] };
  test('same inputs give the same fingerprint regardless of record order', () => {
    expect(spotFingerprint(base)).toBe(spotFingerprint({ ...base, supports: [support(3), support(2)] }));
  });
  test('a height change on the spot’s second support is named; a hazard move and a ground change are named', () => {
    const before = spotFingerprint(base);
    const taller = spotFingerprint({ ...base, supports: [support(2), support(3, { heightM: 25 })] });
    expect(fingerprintChanges(before, taller, ['Oak 2', 'Oak 3'])).toEqual([
      'Oak 3 changed since the review (position, height or ends).',
    ]);
    const moved = spotFingerprint({ ...base, hazards: [{ ...line, points: [line.points[0], { lat: 45.002, lon: -92.999 }] }] });
    expect(fingerprintChanges(before, moved, ['Oak 2', 'Oak 3'])[0]).toMatch(/hazard/);
    const wet = spotFingerprint({ ...base, site: { ...site, groundClass: 'very-good' } });
    expect(fingerprintChanges(before, wet, ['Oak 2', 'Oak 3'])[0]).toMatch(/ground/);
  });
  test('a support unrelated to the spot does not change it', () => {
    expect(spotFingerprint({ ...base, supports: [...base.supports, support(4)] })).toBe(spotFingerprint(base));
  });
});

describe('review state', () => {
  const fp = 'v1.sAAAAAAAA.hBBBBBBBB.gCCCCCCCC';
  const results = [
    { key: 'power-line:L1', level: 'needs-review' as const, message: 'Line 14 m away, review margin 12.1 m.' },
    { key: 'public-area:P1', level: 'clear' as const, message: 'Path 40 m away.' },
  ];
  const spot = { state: 'waiting-review' as const, inputsFingerprint: fp, stateReason: '' };

  test('waiting for review until every result is accepted; then cleared to raise', () => {
    const one = reviewSpot({ spot, results, decisions: [decision('power-line:L1', 'accept', fp)], currentFingerprint: fp, supportLabels: ['Oak 2'] });
    expect(one.state).toBe('waiting-review');
    expect(one.pendingCount).toBe(1);
    const both = reviewSpot({
      spot,
      results,
      decisions: [decision('power-line:L1', 'accept', fp), decision('public-area:P1', 'accept', fp, T, 91)],
      currentFingerprint: fp,
      supportLabels: ['Oak 2'],
    });
    expect(both.state).toBe('cleared');
  });

  test('a blocked result sends the spot back even if someone recorded an acceptance for it', () => {
    const r = reviewSpot({
      spot,
      results: [{ key: 'power-line:L1', level: 'blocked', message: 'A falling support reaches within 10 ft of the line.' }],
      decisions: [decision('power-line:L1', 'accept', fp)],
      currentFingerprint: fp,
      supportLabels: [],
    });
    expect(r.state).toBe('sent-back');
    expect(r.results[0].needs).toBe('move-spot');
    expect(r.reasons[0]).toMatch(/must move/);
  });

  test('the latest decision supersedes an earlier one; a send-back wins until a later acceptance', () => {
    const d1 = decision('power-line:L1', 'accept', fp, '2026-12-01T10:00:00.000Z', 91);
    const d2 = decision('power-line:L1', 'send-back', fp, '2026-12-01T11:00:00.000Z', 92);
    const d3 = decision('public-area:P1', 'accept', fp, T, 93);
    const r = reviewSpot({ spot, results, decisions: [d1, d2, d3], currentFingerprint: fp, supportLabels: [] });
    expect(r.state).toBe('sent-back');
    const d4 = decision('power-line:L1', 'accept', fp, '2026-12-01T12:00:00.000Z', 94);
    expect(reviewSpot({ spot, results, decisions: [d1, d2, d3, d4], currentFingerprint: fp, supportLabels: [] }).state).toBe('cleared');
  });

  test('a cleared spot whose support changed goes back to review and says why', () => {
    const newFp = 'v1.sDDDDDDDD.hBBBBBBBB.gCCCCCCCC';
    const r = reviewSpot({
      spot: { ...spot, state: 'cleared' },
      results,
      decisions: [decision('power-line:L1', 'accept', fp), decision('public-area:P1', 'accept', fp, T, 91)],
      currentFingerprint: newFp,
      supportLabels: ['Oak 2'],
    });
    expect(r.state).toBe('waiting-review');
    expect(r.staleDecisionCount).toBe(2);
    expect(r.reasons).toEqual(['Oak 2 changed since the review (position, height or ends).']);
  });

  test('an antenna marked up stays up while its inputs are unchanged', () => {
    const r = reviewSpot({
      spot: { ...spot, state: 'up' },
      results,
      decisions: [decision('power-line:L1', 'accept', fp), decision('public-area:P1', 'accept', fp, T, 91)],
      currentFingerprint: fp,
      supportLabels: [],
    });
    expect(r.state).toBe('up');
  });

  test('no results means it cannot be cleared', () => {
    const r = reviewSpot({ spot, results: [], decisions: [], currentFingerprint: fp, supportLabels: [] });
    expect(r.state).toBe('waiting-review');
    expect(r.reasons.join(' ')).toMatch(/cannot be cleared/);
  });

  test('decision checks: blocked cannot be accepted, stale fingerprint refused, unknown key refused', () => {
    const blocked = [{ key: 'k', level: 'blocked' as const, message: 'x' }];
    expect(decisionProblem({ resultKey: 'k', decision: 'accept', reason: 'looks fine', inputsFingerprint: fp }, blocked, fp)).toMatch(/cannot be accepted/);
    expect(decisionProblem({ resultKey: 'k', decision: 'send-back', reason: 'move it', inputsFingerprint: fp }, blocked, fp)).toBeNull();
    expect(decisionProblem({ resultKey: 'k', decision: 'send-back', reason: 'move it', inputsFingerprint: 'old' }, blocked, fp)).toMatch(/changed/);
    expect(decisionProblem({ resultKey: 'zz', decision: 'accept', reason: 'ok ok', inputsFingerprint: fp }, blocked, fp)).toMatch(/no longer/);
  });
});
