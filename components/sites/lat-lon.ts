/**
 * "44.81234° N, 93.50210° W": five decimals of a degree is about 1.1 m of latitude (one degree of
 * latitude ≈ 111.32 km on WGS 84), finer than a phone fix and plenty for a meeting point.
 */
export function formatLatLon(lat: number, lon: number): string {
  const ns = lat >= 0 ? 'N' : 'S';
  const ew = lon >= 0 ? 'E' : 'W';
  return `${Math.abs(lat).toFixed(5)}° ${ns}, ${Math.abs(lon).toFixed(5)}° ${ew}`;
}
