import { describe, expect, it, vi } from 'vitest';
import { idSchema } from '../../shared/schemas';
import { randomId } from './random-id';

describe('record ids', () => {
  it('are RFC 4122 version-4 UUIDs, also where crypto.randomUUID is missing (insecure http origin)', () => {
    expect(idSchema.safeParse(randomId()).success).toBe(true);
    const real = globalThis.crypto;
    vi.stubGlobal('crypto', { getRandomValues: (a: Uint8Array) => real.getRandomValues(a) });
    try {
      const ids = Array.from({ length: 50 }, randomId);
      for (const id of ids) expect(id).toMatch(/^[0-9a-f]{8}-[0-9a-f]{4}-4[0-9a-f]{3}-[89ab][0-9a-f]{3}-[0-9a-f]{12}$/);
      expect(new Set(ids).size).toBe(50);
    } finally {
      vi.unstubAllGlobals();
    }
  });
});
