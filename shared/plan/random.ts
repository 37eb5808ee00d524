/** A seeded source of uniform numbers in [0, 1): injected wherever the engine needs randomness. */
export type RandomSource = () => number;

/** mulberry32: a small, fast 32-bit generator; the same seed always gives the same sequence. */
export function seededRandom(seed: number): RandomSource {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
