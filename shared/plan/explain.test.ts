import { describe, expect, it } from 'vitest';
import { antennaWords, spotWords } from './explain';

describe('assignment explanations in words, not ids', () => {
  it('names an inverted-V by its support and leg bearing, a flat-top by its two supports', () => {
    expect(spotWords('20m:iv:Centre mast@45')).toBe('the inverted-V at Centre mast (legs 45°–225°)');
    expect(spotWords('40m:iv:t1@0')).toBe('the inverted-V at t1 (legs 0°–180°)');
    expect(spotWords('40m:flat:t1~t7')).toBe('the flat-top t1–t7');
    expect(spotWords('something-else')).toBe('something-else');
  });

  it('names an antenna by its station and band', () => {
    expect(antennaWords('s2:15m')).toBe('s2 15m');
    expect(antennaWords('Station: high:20m')).toBe('Station: high 20m');
  });
});
