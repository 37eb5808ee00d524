import type { Hazard, OperatingPosition, Support } from '@/shared/schemas';
import { HAZARD_KIND_LABEL, VOLTAGE_HELP } from '../forms/hazard-form-logic';

/* One line of plain words per record, for the list and the plan's side panel. */

export const SUPPORT_KIND_LABEL: Record<Support['kind'], string> = { tree: 'Tree', mast: 'Mast spot', structure: 'Structure' };

export const LAUNCH_LABEL: Record<NonNullable<Support['launchMethod']>, string> = {
  'hand-throw': 'Hand throw', 'throw-bag': 'Throw bag', slingshot: 'Slingshot', pneumatic: 'Pneumatic launcher', climb: 'Climb', none: 'No launch (mast pulley)',
};

type Fmt = (m: number | null | undefined) => string;

export function supportSummary(s: Support, fmt: Fmt): string {
  const parts = [SUPPORT_KIND_LABEL[s.kind]];
  if (s.heightM !== null) parts.push(`${fmt(s.heightM)} tall`);
  if (s.attachHeightM !== null) parts.push(`attach at ${fmt(s.attachHeightM)}`);
  if (s.kind === 'mast' && s.mastModel) parts.push(s.mastModel);
  else if (s.launchMethod) parts.push(LAUNCH_LABEL[s.launchMethod]);
  return parts.join(' · ');
}

export function hazardSummary(h: Hazard, fmt: Fmt): string {
  const parts = [HAZARD_KIND_LABEL[h.kind]];
  if (h.kind === 'power-line') {
    parts.push(VOLTAGE_HELP[h.voltageClass ?? 'unknown'].label.toLowerCase());
    if (h.voltageKv !== null) parts.push(`${h.voltageKv} kV`);
    parts.push(h.heightM !== null ? `${fmt(h.heightM)} up` : 'height not given');
  }
  parts.push(`${h.points.length} ${h.isArea ? 'corners' : 'points'}`);
  return parts.join(' · ');
}

export function positionSummary(o: OperatingPosition): string {
  return o.notes ? `Operating position · ${o.notes.split('\n')[0].slice(0, 60)}` : 'Operating position';
}
