import { describe, expect, it } from 'vitest';
import { safeNext } from './safe-next';

describe('safeNext (open-redirect guard, OWASP Unvalidated Redirects cheat sheet)', () => {
  it('keeps a path inside the app', () => {
    expect(safeNext('/events/abc')).toBe('/events/abc');
  });
  it('refuses other sites, protocol-relative and backslash tricks, and loops back to sign-in', () => {
    for (const bad of ['https://evil.test', '//evil.test', '/\\evil.test', 'events', '/sign-in', undefined]) expect(safeNext(bad)).toBe('/');
  });
});
