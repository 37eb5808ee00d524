import { describe, expect, it } from 'vitest';
import { formatLatLon } from './lat-lon';

describe('formatLatLon', () => {
  it('writes hemispheres as letters, never a bare minus sign (west and south are negative in WGS 84 decimal degrees)', () => {
    expect(formatLatLon(44.812345, -93.5021)).toBe('44.81235° N, 93.50210° W');
    expect(formatLatLon(-33.8688, 151.2093)).toBe('33.86880° S, 151.20930° E');
  });
});
