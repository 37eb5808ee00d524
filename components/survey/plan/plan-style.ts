import { colors } from '@/constants/theme';
import type { Hazard } from '@/shared/schemas';

/*
 * How the site plan draws each kind of thing. Power lines get the danger colour, a wide pale band and a
 * dashed core so they read as a danger even on a screen washed out by sunlight or in grey-scale print.
 */

export const planColors = {
  ground: '#EFE7D4',
  grid: '#DDD2BA',
  gridMajor: '#C9BC9F',
  tree: '#2E6B2F',
  treeCrown: '#CFE6C2',
  mast: colors.action,
  structure: '#5B4A32',
  position: colors.brandInk,
  positionFill: '#FFE2CC',
  me: '#1446A0',
  meAccuracy: 'rgba(20, 70, 160, 0.16)',
  selected: colors.brand,
  label: colors.ink,
  halo: '#FFFCF6',
  danger: colors.danger,
  dangerBand: 'rgba(164, 34, 27, 0.18)',
} as const;

export type HazardLook = { stroke: string; fill: string; widthPx: number; dash?: string; label: string };

export const HAZARD_LOOK: Record<Hazard['kind'], HazardLook> = {
  'power-line': { stroke: colors.danger, fill: 'none', widthPx: 4, dash: '10 6', label: 'Power line' },
  path: { stroke: '#7A5A2B', fill: 'none', widthPx: 3, dash: '2 6', label: 'Path' },
  road: { stroke: '#4C4C4C', fill: 'rgba(76, 76, 76, 0.25)', widthPx: 7, label: 'Road' },
  parking: { stroke: '#4C4C4C', fill: 'rgba(76, 76, 76, 0.18)', widthPx: 2, dash: '6 4', label: 'Parking' },
  building: { stroke: '#3A3129', fill: 'rgba(58, 49, 41, 0.55)', widthPx: 2, label: 'Building' },
  water: { stroke: '#1C5D99', fill: 'rgba(52, 129, 201, 0.45)', widthPx: 2, label: 'Water' },
};
