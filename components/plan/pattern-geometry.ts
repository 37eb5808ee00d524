/*
 * Pure geometry of the pattern pictures (no React): polar plots on a dB scale and the SWR chart. A gain is
 * drawn at a radius proportional to how far it is above (peak − rangeDb), so the peak touches the outer ring
 * and anything rangeDb or more below it sits at the centre (the usual dB-polar plot of the trade).
 */

export type Pt = { x: number; y: number };
const RAD = Math.PI / 180;

export function radiusFraction(gainDbi: number, peakDbi: number, rangeDb = 30): number {
  if (!Number.isFinite(gainDbi)) return 0;
  return Math.min(1, Math.max(0, (gainDbi - (peakDbi - rangeDb)) / rangeDb));
}

/** Elevation picture: a half disc, 0° at the right horizon, 90° straight up, 180° the left horizon. */
export function elevationPoint(elevationDeg: number, fraction: number, cx: number, cy: number, r: number): Pt {
  return { x: cx + r * fraction * Math.cos(elevationDeg * RAD), y: cy - r * fraction * Math.sin(elevationDeg * RAD) };
}

/**
 * The broadside elevation cut (0…90°) drawn on both sides: a horizontal dipole over flat ground radiates the
 * same toward either broadside direction, so the left half mirrors the right (image theory, symmetric geometry).
 */
export function elevationPath(points: readonly { deg: number; gainDbi: number }[], peakDbi: number, cx: number, cy: number, r: number, rangeDb = 30): string {
  const right = points.map((p) => elevationPoint(p.deg, radiusFraction(p.gainDbi, peakDbi, rangeDb), cx, cy, r));
  const left = [...points].reverse().map((p) => elevationPoint(180 - p.deg, radiusFraction(p.gainDbi, peakDbi, rangeDb), cx, cy, r));
  return `M${cx} ${cy} ` + [...right, ...left].map((p) => `L${p.x.toFixed(1)} ${p.y.toFixed(1)}`).join(' ') + ' Z';
}

/** A wedge between two elevation angles on the right side (an operator window), from the centre to the rim. */
export function elevationWedge(fromDeg: number, toDeg: number, cx: number, cy: number, r: number): string {
  const a = elevationPoint(fromDeg, 1, cx, cy, r);
  const b = elevationPoint(toDeg, 1, cx, cy, r);
  const large = toDeg - fromDeg > 180 ? 1 : 0;
  return `M${cx} ${cy} L${a.x.toFixed(1)} ${a.y.toFixed(1)} A${r} ${r} 0 ${large} 0 ${b.x.toFixed(1)} ${b.y.toFixed(1)} Z`;
}

/** Compass picture: bearing 0° (north) up, 90° (east) right. */
export function compassPoint(bearingDeg: number, fraction: number, cx: number, cy: number, r: number): Pt {
  return { x: cx + r * fraction * Math.sin(bearingDeg * RAD), y: cy - r * fraction * Math.cos(bearingDeg * RAD) };
}

/**
 * An azimuth cut turned to the compass: the model's azimuth 0° runs along the wire toward its first end,
 * whose compass bearing is wireAzimuthDeg; so model azimuth a points to bearing wireAzimuthDeg + a.
 */
export function azimuthPath(points: readonly { azimuthDeg: number; gainDbi: number }[], peakDbi: number, wireAzimuthDeg: number, cx: number, cy: number, r: number, rangeDb = 30): string {
  const pts = points.map((p) => compassPoint(wireAzimuthDeg + p.azimuthDeg, radiusFraction(p.gainDbi, peakDbi, rangeDb), cx, cy, r));
  return pts.map((p, i) => `${i === 0 ? 'M' : 'L'}${p.x.toFixed(1)} ${p.y.toFixed(1)}`).join(' ') + ' Z';
}

export type ChartBox = { x: number; y: number; width: number; height: number };

/** SWR across the band as a line: frequency left to right, SWR 1 at the bottom up to maxSwr at the top (clamped). */
export function swrPoint(freqMhz: number, swr: number, fromMhz: number, toMhz: number, maxSwr: number, box: ChartBox): Pt {
  const fx = (freqMhz - fromMhz) / (toMhz - fromMhz);
  const fy = (Math.min(Math.max(swr, 1), maxSwr) - 1) / (maxSwr - 1);
  return { x: box.x + fx * box.width, y: box.y + box.height - fy * box.height };
}

export function swrPath(points: readonly { freqMhz: number; swr50: number }[], fromMhz: number, toMhz: number, maxSwr: number, box: ChartBox): string {
  return points
    .map((p, i) => {
      const q = swrPoint(p.freqMhz, p.swr50, fromMhz, toMhz, maxSwr, box);
      return `${i === 0 ? 'M' : 'L'}${q.x.toFixed(1)} ${q.y.toFixed(1)}`;
    })
    .join(' ');
}
