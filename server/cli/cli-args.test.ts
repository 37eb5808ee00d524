import { afterEach, describe, expect, it, vi } from 'vitest';
import { joinNegativeValues, parseFlags } from './cli-args';
import * as demoSite from './commands/demo-site';
import * as pattern from './commands/pattern';
import * as propose from './commands/propose';

// What a person typing a command sees when a flag is wrong: one line on stderr, exit code 2 (common practice
// for command-line tools: a usage error is not a crash and is not spread over several lines).

afterEach(() => vi.restoreAllMocks());

function stderr(): string[] {
  const err: string[] = [];
  vi.spyOn(console, 'error').mockImplementation((...a: unknown[]) => void err.push(a.join(' ')));
  vi.spyOn(console, 'log').mockImplementation(() => undefined);
  return err;
}

describe('command-line flags', () => {
  it('a negative number after a value flag is taken as its value, not as an unknown flag', () => {
    const opts = { 'height-m': { type: 'string' }, json: { type: 'boolean' } } as const;
    expect(joinNegativeValues(['--height-m', '-3', '--json'], opts)).toEqual(['--height-m=-3', '--json']);
    expect(joinNegativeValues(['--height-m', '-.5'], opts)).toEqual(['--height-m=-.5']);
    // A boolean flag never swallows the next word; a dash word that is not a number stays a flag.
    expect(joinNegativeValues(['--json', '-3'], opts)).toEqual(['--json', '-3']);
    expect(joinNegativeValues(['--height-m', '--json'], opts)).toEqual(['--height-m', '--json']);
  });

  it('a parse error is one line that names the flag and ends with the usage', () => {
    const r = parseFlags(['--bogus'], { site: { type: 'string' } }, 'x --site <file>');
    expect(r).toEqual({ error: "Unknown option '--bogus'; usage: x --site <file>" });
  });

  it('pattern --height-m -3 answers with the height rule on one line, not the parser’s three-line hint', async () => {
    const err = stderr();
    expect(await pattern.run(['--mhz', '7.1', '--height-m', '-3', '--ground', 'average'])).toBe(2);
    expect(err).toEqual(['pattern: heightM: height must be above 0 m']);
  });

  it('demo-site --supports -1 says the allowed range', async () => {
    const err = stderr();
    expect(await demoSite.run(['--supports', '-1', '--seed', '7'])).toBe(2);
    expect(err).toEqual(['demo-site: --supports must be a whole number from 1 to 5000 (got "-1")']);
  });

  it('an unknown flag and a missing value both show the command’s usage', async () => {
    const err = stderr();
    expect(await propose.run(['--help'])).toBe(2);
    expect(await propose.run(['--site'])).toBe(2);
    expect(err).toHaveLength(2);
    for (const line of err) {
      expect(line).not.toContain('\n');
      expect(line).toMatch(/^propose: .+; usage: propose --site <file>/);
    }
  });
});
