import { afterEach, describe, expect, it, vi } from 'vitest';
import { run } from './pattern';
import { captureOutput } from '../capture-output';

afterEach(() => vi.restoreAllMocks());

describe('loftline pattern', () => {
  it('--json prints one object with the documented fields; λ/2-high wire over perfect ground peaks near 30° (image theory)', async () => {
    const io = captureOutput();
    const lambda = 299.792458 / 14.2;
    const code = await run(['--mhz', '14.2', '--height-m', String(lambda / 2), '--ground', 'perfect', '--length-m', String(lambda / 2), '--json']);
    expect(code).toBe(0);
    const j = JSON.parse(io.out.join('\n'));
    for (const k of ['peakGainDbi', 'takeoffDeg', 'halfPower', 'lobes', 'elevation', 'feed', 'swr50']) expect(j).toHaveProperty(k);
    expect(j.takeoffDeg).toBeCloseTo(30, 1);
    expect(j.peakGainDbi).toBeCloseTo(8.42, 1);
    expect(j.elevation).toHaveLength(181);
    expect(j.elevation[1]).toMatchObject({ deg: 0.5 });
    expect(j.feed.resistanceOhm).toBeGreaterThan(60);
  });

  it('without --length-m the wire is cut by the 468/f rule; custom --sigma/--epsr and inverted-V work', async () => {
    const io = captureOutput();
    expect(await run(['--mhz', '7.1', '--height-m', '14', '--sigma', '0.01', '--epsr', '20', '--shape', 'inverted-v', '--apex-deg', '110', '--json'])).toBe(0);
    const j = JSON.parse(io.out.join('\n'));
    expect(j.input.lengthM / 0.3048).toBeCloseTo(468 / 7.1, 6);
    expect(j.input.ground).toEqual({ kind: 'real', sigmaSPerM: 0.01, epsR: 20 });
  });

  it('text output names the figures and says the results are planning estimates', async () => {
    const io = captureOutput();
    expect(await run(['--mhz', '14.2', '--height-m', '10', '--ground', 'average'])).toBe(0);
    const text = io.out.join('\n');
    expect(text).toMatch(/Peak gain/);
    expect(text).toMatch(/Planning estimate/);
  });

  it('bad arguments: one-line error on stderr and exit code 2', async () => {
    for (const argv of [
      ['--height-m', '10', '--ground', 'average'],
      ['--mhz', 'x', '--height-m', '10', '--ground', 'average'],
      ['--mhz', '14', '--height-m', '10', '--ground', 'swamp'],
      ['--mhz', '14', '--height-m', '10', '--sigma', '0.01'],
      ['--mhz', '14', '--height-m', '10', '--ground', 'average', '--shape', 'loop'],
      ['--mhz', '7.1', '--height-m', '3', '--ground', 'average', '--shape', 'inverted-v'],
      ['--mhz', '14', '--height-m', '10', '--ground', 'average', '--bogus'],
    ]) {
      const io = captureOutput();
      expect(await run(argv)).toBe(2);
      expect(io.err).toHaveLength(1);
      expect(io.err[0]).toMatch(/^pattern: /);
      expect(io.err[0]).not.toMatch(/\n/);
      vi.restoreAllMocks();
    }
  });

  it('--help says the results are planning estimates', async () => {
    const io = captureOutput();
    expect(await run(['--help'])).toBe(0);
    expect(io.out.join('\n')).toMatch(/planning estimates/);
  });
});
