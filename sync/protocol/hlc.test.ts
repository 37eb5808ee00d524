import { describe, expect, it } from 'vitest';
import { MAX_CLOCK_AHEAD_MS, clampClock } from './clock-rules';
import { compareHlc, createHybridClock, decodeHlc, encodeHlc } from './hlc';
import { checkVersions, PROTOCOL_VERSION, SCHEMA_VERSION } from './versions';

describe('hybrid logical clock (Kulkarni et al. 2014, "Logical Physical Clocks")', () => {
  it('string order equals (wall, counter, node) order', () => {
    const clocks = [
      { wallMs: 2, counter: 0, node: 'a' },
      { wallMs: 10, counter: 0, node: 'a' },
      { wallMs: 10, counter: 1, node: 'a' },
      { wallMs: 10, counter: 1, node: 'b' },
      { wallMs: 1_764_600_000_000, counter: 0, node: 'a' },
    ];
    const encoded = clocks.map(encodeHlc);
    expect([...encoded].sort()).toEqual(encoded);
    expect(decodeHlc(encoded[3])).toEqual(clocks[3]);
  });

  it('never goes backwards when the wall clock does, and counts within one millisecond', () => {
    let now = 5_000;
    const c = createHybridClock({ node: 'dev', nowMs: () => now, maxFutureMs: MAX_CLOCK_AHEAD_MS });
    const a = c.tick();
    const b = c.tick();
    now = 1_000; // the phone's clock was set back
    const d = c.tick();
    expect(compareHlc(a, b)).toBeLessThan(0);
    expect(compareHlc(b, d)).toBeLessThan(0);
    expect(decodeHlc(d)).toEqual({ wallMs: 5_000, counter: 2, node: 'dev' });
  });

  it('after observing a remote clock, the next local event sorts after it (causality)', () => {
    const c = createHybridClock({ node: 'b', nowMs: () => 1_000, maxFutureMs: MAX_CLOCK_AHEAD_MS });
    const remote = encodeHlc({ wallMs: 30_000, counter: 4, node: 'a' });
    c.observe(remote);
    expect(compareHlc(c.tick(), remote)).toBeGreaterThan(0);
  });

  it('follows a remote clock from the far future only up to the bound', () => {
    const c = createHybridClock({ node: 'b', nowMs: () => 1_000, maxFutureMs: 60_000 });
    c.observe(encodeHlc({ wallMs: 1_000 + 86_400_000, counter: 0, node: 'a' }));
    expect(decodeHlc(c.tick()).wallMs).toBe(61_000);
  });

  it('resumes from its persisted last clock after a restart', () => {
    const first = createHybridClock({ node: 'dev', nowMs: () => 9_000, maxFutureMs: 0 });
    first.tick();
    const again = createHybridClock({ node: 'dev', nowMs: () => 100, last: first.last(), maxFutureMs: 0 });
    expect(decodeHlc(again.tick())).toEqual({ wallMs: 9_000, counter: 1, node: 'dev' });
  });

  it(`the server pulls clocks more than ${MAX_CLOCK_AHEAD_MS} ms ahead back to that bound, keeping counter and node`, () => {
    const ahead = encodeHlc({ wallMs: 1_000 + 86_400_000, counter: 7, node: 'fast' });
    expect(decodeHlc(clampClock(ahead, 1_000).clock)).toEqual({ wallMs: 1_000 + MAX_CLOCK_AHEAD_MS, counter: 7, node: 'fast' });
    const fine = encodeHlc({ wallMs: 1_000 + MAX_CLOCK_AHEAD_MS, counter: 0, node: 'ok' });
    expect(clampClock(fine, 1_000)).toEqual({ clock: fine, clamped: false });
  });
});

describe('protocol versions', () => {
  it('answers typed too-old verdicts either way', () => {
    expect(checkVersions(PROTOCOL_VERSION, SCHEMA_VERSION).type).toBe('ok');
    expect(checkVersions(PROTOCOL_VERSION + 1, SCHEMA_VERSION).type).toBe('server-too-old');
    expect(checkVersions(0, SCHEMA_VERSION).type).toBe('client-too-old');
    expect(checkVersions(PROTOCOL_VERSION, SCHEMA_VERSION + 1).type).toBe('server-too-old');
  });
});
