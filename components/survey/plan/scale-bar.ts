/*
 * Scale-bar lengths a person reads at a glance: 1, 2 or 5 times a power of ten, in metres or feet
 * (the user's units setting), as long as possible without passing `maxPx`.
 */

import { M_PER_FT, type UnitSystem } from '../../../hooks/length-format';

export type ScaleBar = { lengthM: number; px: number; label: string };

/** The largest 1·2·5 × 10^k value not above `x` (x > 0). */
export function niceFloor(x: number): number {
  if (!(x > 0) || !Number.isFinite(x)) return 0;
  const exp = Math.floor(Math.log10(x));
  const base = 10 ** exp;
  // Small tolerance: 5.0000000001 from float noise still counts as 5.
  const m = x / base + 1e-9;
  const step = m >= 5 ? 5 : m >= 2 ? 2 : 1;
  return step * base;
}

function formatAmount(value: number): string {
  if (value >= 1) return String(Math.round(value));
  return String(Number(value.toPrecision(1)));
}

export function scaleBar(pxPerM: number, maxPx: number, system: UnitSystem): ScaleBar {
  if (system === 'imperial') {
    const pxPerFt = pxPerM * M_PER_FT;
    const ft = niceFloor(maxPx / pxPerFt);
    if (ft >= 5280 / 2 && niceFloor(maxPx / (pxPerFt * 5280)) >= 1) {
      const mi = niceFloor(maxPx / (pxPerFt * 5280));
      return { lengthM: mi * 5280 * M_PER_FT, px: mi * 5280 * pxPerFt, label: `${formatAmount(mi)} mi` };
    }
    return { lengthM: ft * M_PER_FT, px: ft * pxPerFt, label: `${formatAmount(ft)} ft` };
  }
  const m = niceFloor(maxPx / pxPerM);
  if (m >= 1000) return { lengthM: m, px: m * pxPerM, label: `${formatAmount(m / 1000)} km` };
  return { lengthM: m, px: m * pxPerM, label: `${formatAmount(m)} m` };
}
