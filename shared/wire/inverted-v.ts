/*
 * Inverted-V from one support: apex (feed point) at apexHeightM, each leg half the wire, sloping down at
 * half the included angle from the vertical. End height = apex − leg·cos(angle/2); the ends are spread
 * 2·leg·sin(angle/2) apart on the ground plan. Geometry only; rope from the ends to stakes comes on top.
 */
export type InvertedV = { legM: number; endHeightM: number; endSpreadM: number; apexDeg: number };

export function invertedV(o: { apexHeightM: number; wireLengthM: number; apexDeg?: number }): InvertedV {
  const apexDeg = o.apexDeg ?? 120;
  if (!(o.apexHeightM > 0)) throw new Error(`apex height must be above 0 m (got ${o.apexHeightM})`);
  if (!(o.wireLengthM > 0)) throw new Error(`wire length must be above 0 m (got ${o.wireLengthM})`);
  if (!(apexDeg >= 30 && apexDeg <= 180)) throw new Error(`apex angle must be 30–180° (got ${apexDeg})`);
  const legM = o.wireLengthM / 2;
  const half = ((apexDeg / 2) * Math.PI) / 180;
  const endHeightM = o.apexHeightM - legM * Math.cos(half);
  if (endHeightM <= 0) {
    throw new Error(`the ends would be ${(-endHeightM).toFixed(2)} m below ground: raise the apex or open the angle`);
  }
  return { legM, endHeightM, endSpreadM: 2 * legM * Math.sin(half), apexDeg };
}

/** Included angle that puts the ends at endHeightM for a given apex height and wire. */
export function apexDegForEndHeight(o: { apexHeightM: number; wireLengthM: number; endHeightM: number }): number {
  const legM = o.wireLengthM / 2;
  const drop = o.apexHeightM - o.endHeightM;
  if (!(legM > 0) || !(o.endHeightM > 0) || drop < 0 || drop > legM) {
    throw new Error('end height must be above 0, below the apex, and within one leg of it');
  }
  return (2 * Math.acos(drop / legM) * 180) / Math.PI;
}
