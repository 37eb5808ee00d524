import { mkdtempSync, readFileSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { SAFETY_CAUTION } from '../../../shared/clearance/cautions';
import { captureOutput } from '../capture-output';
import * as assign from './assign';
import * as demoSite from './demo-site';
import * as propose from './propose';

const dir = mkdtempSync(join(tmpdir(), 'loftline-plan-cli-'));

afterEach(() => vi.restoreAllMocks());

describe('demo-site, propose and assign commands', { timeout: 120_000 }, () => {
  const file = join(dir, 'park.json');

  it('demo-site writes the same invented park for the same seed', async () => {
    expect(await demoSite.run(['--supports', '30', '--seed', '7', '--out', file])).toBe(0);
    const first = readFileSync(file, 'utf8');
    const again = join(dir, 'again.json');
    await demoSite.run(['--supports', '30', '--seed', '7', '--out', again]);
    expect(readFileSync(again, 'utf8')).toBe(first);
    expect(JSON.parse(first).supports).toHaveLength(30);
  });

  it('demo-site refuses bad arguments with one line and a non-zero exit', async () => {
    const { err } = captureOutput();
    expect(await demoSite.run(['--supports', 'many', '--seed', '1'])).toBe(2);
    expect(await demoSite.run(['--supports', '10'])).toBe(2);
    expect(err).toHaveLength(2);
    expect(err[0]).toMatch(/^demo-site: --supports must be/);
  });

  it('propose prints ranked spots per station and the caution line', async () => {
    const { out } = captureOutput();
    expect(await propose.run(['--site', file, '--top', '2'])).toBe(0);
    const text = out.join('\n');
    expect(text).toMatch(/main-40 · 40m/);
    expect(text).toMatch(/1\. (flat-top|inverted-V)/);
    expect(text.trim().endsWith(SAFETY_CAUTION)).toBe(true);
  });

  it('propose --station --json gives that station only, as JSON with the cautions', async () => {
    const { out } = captureOutput();
    expect(await propose.run(['--site', file, '--station', 'dx-20', '--json'])).toBe(0);
    const json = JSON.parse(out.join('\n'));
    expect(json.caution).toBe(SAFETY_CAUTION);
    expect(json.antennas.map((a: { need: { key: string } }) => a.need.key)).toEqual(['dx-20:20m']);
  });

  it('assign prints the chosen spot per station and the caution line; --json parses', async () => {
    const { out } = captureOutput();
    expect(await assign.run(['--site', file])).toBe(0);
    expect(out.join('\n')).toMatch(/^Assignment \(branch-and-bound, proven best/);
    expect(out.join('\n').trim().endsWith(SAFETY_CAUTION)).toBe(true);
    out.length = 0;
    expect(await assign.run(['--site', file, '--json'])).toBe(0);
    expect(JSON.parse(out.join('\n')).assignment.spots).toHaveLength(6);
  });

  it('a bad site file gets a clear message naming the field', async () => {
    const bad = JSON.parse(readFileSync(file, 'utf8'));
    bad.supports[2].heigthM = 4;
    bad.stations[0].powerW = -5;
    const badFile = join(dir, 'bad.json');
    writeFileSync(badFile, JSON.stringify(bad));
    const { err } = captureOutput();
    expect(await propose.run(['--site', badFile])).toBe(1);
    expect(err).toContain(`propose: ${badFile}: supports[2].heigthM: unknown field`);
    expect(err).toContain(`propose: ${badFile}: stations[0].powerW: power must be above 0`);
    err.length = 0;
    expect(await assign.run(['--site', join(dir, 'missing.json')])).toBe(1);
    expect(err[0]).toMatch(/^assign: cannot read/);
    err.length = 0;
    expect(await propose.run(['--site', file, '--station', 'nobody'])).toBe(2);
    expect(err[0]).toMatch(/^propose: --station "nobody" is not in .* \(stations: night-80, main-40/);
    err.length = 0;
    expect(await assign.run(['--sight', file])).toBe(2);
    expect(err).toHaveLength(1);
  });
});
