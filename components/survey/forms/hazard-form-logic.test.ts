import { describe, expect, it } from 'vitest';
import { CAUTION_LINES } from '../../../shared/clearance/cautions';
import { POWER_LINE_CAUTION, VOLTAGE_HELP, checkHazard, draftFromHazard, emptyHazardDraft } from './hazard-form-logic';

const siteId = '11111111-1111-4111-8111-111111111111';
const m = (v: number) => v;
const pts = (n: number) => Array.from({ length: n }, (_, i) => ({ lat: 44.5 + i * 1e-4, lon: -93.2 }));

describe('hazard form logic (shared hazardFieldsSchema + power-line questions)', () => {
  it('a power line walked at three points with a height and class is accepted', () => {
    const r = checkHazard({ ...emptyHazardDraft('power-line'), label: 'Road line', points: pts(3), heightText: '9', voltageClass: 'distribution', voltageKvText: '12.47' }, siteId, m);
    expect(r.errors).toEqual({});
    expect(r.fields).toMatchObject({ kind: 'power-line', heightM: 9, voltageClass: 'distribution', voltageKv: 12.47, isArea: false });
  });

  it('opening and saving a power line unchanged keeps its stored height exactly', () => {
    const stored = checkHazard({ ...emptyHazardDraft('power-line'), label: 'L', points: pts(2), heightText: '9.4488' }, siteId, m).fields!;
    expect(checkHazard(draftFromHazard(stored, (x) => x / 0.3048), siteId, (v) => v * 0.3048).fields!.heightM).toBe(stored.heightM);
  });

  it('a power line with one point is refused (the schema needs two)', () => {
    const r = checkHazard({ ...emptyHazardDraft('power-line'), label: 'Line', points: pts(1) }, siteId, m);
    expect(r.fields).toBeNull();
    expect(r.errors.points).toMatch(/two points/);
  });

  it('a new power line starts as "not sure" of its voltage, planned as transmission (REFERENCES.md: unknown voltage → transmission)', () => {
    expect(emptyHazardDraft('power-line').voltageClass).toBe('unknown');
    expect(VOLTAGE_HELP.unknown.help).toMatch(/transmission/);
    expect(POWER_LINE_CAUTION).toMatch(/treat every line as energised/i);
    expect(CAUTION_LINES.join(' ')).toMatch(/energised/);
  });

  it('questions a missing height, a 2 m line, and a kV that does not fit the class (typical voltages, Short’s handbook via REFERENCES.md)', () => {
    const noHeight = checkHazard({ ...emptyHazardDraft('power-line'), label: 'L', points: pts(2) }, siteId, m);
    expect(noHeight.fields).not.toBeNull();
    expect(noHeight.questions.join(' ')).toMatch(/No height/);
    expect(checkHazard({ ...emptyHazardDraft('power-line'), label: 'L', points: pts(2), heightText: '2' }, siteId, m).questions.join(' ')).toMatch(/unusually low/);
    expect(checkHazard({ ...emptyHazardDraft('power-line'), label: 'L', points: pts(2), heightText: '8', voltageClass: 'service-drop', voltageKvText: '12.47' }, siteId, m).questions.join(' ')).toMatch(/120\/240 V/);
  });

  it('parking is an area and needs three corners; a path is a line and keeps no voltage', () => {
    const lot = checkHazard({ ...emptyHazardDraft('parking'), label: 'Lot', points: pts(2) }, siteId, m);
    expect(lot.errors.points).toMatch(/three corners/);
    const path = checkHazard({ ...emptyHazardDraft('path'), label: 'Trail', points: pts(2), voltageKvText: '' }, siteId, m);
    expect(path.fields).toMatchObject({ isArea: false, voltageClass: null, voltageKv: null });
  });
});
