import { describe, expect, it } from 'vitest';
import { sha256Hex } from './sha256';
import type { NewPhoto, PhotoStore } from './types';

/*
 * The PhotoStore contract, run against every implementation (memory-photo-store, idb-photo-store on
 * fake-indexeddb). `open(name)` opens or reopens (after a simulated restart) the database called `name`.
 */

export type OpenPhotoStore = (name: string) => Promise<PhotoStore>;

const CLUB = '11111111-1111-4111-8111-111111111111';
const OTHER_CLUB = '22222222-2222-4222-8222-222222222222';
const UPLOAD = '33333333-3333-4333-8333-333333333333';

function photo(seed: number, clubId = CLUB, length = 1000): NewPhoto {
  const data = new Uint8Array(length).map((_, i) => (i * 31 + seed * 7) % 256);
  data.set([0xff, 0xd8, 0xff], 0);
  return { clubId, sha256: sha256Hex(data), mimeType: 'image/jpeg', data };
}

let dbCounter = 0;

export function photoStoreContract(name: string, open: OpenPhotoStore, damage?: (dbName: string, key: string) => Promise<void>): void {
  describe(`PhotoStore contract: ${name}`, () => {
    const fresh = async () => {
      const dbName = `photos-contract-${++dbCounter}`;
      return { dbName, store: await open(dbName) };
    };

    it('keeps the bytes byte-identical under the SHA-256 and queues the photo as waiting', async () => {
      const { store } = await fresh();
      const p = photo(1);
      const entry = await store.add(p, 1000);
      expect(entry).toMatchObject({ clubId: CLUB, sha256: p.sha256, state: 'waiting', bytes: 1000, uploadId: null, attempts: 0 });
      expect(sha256Hex((await store.bytes(CLUB, p.sha256))!)).toBe(p.sha256);
      expect(await store.countWaiting(CLUB)).toBe(1);
    });

    it('adding the same photo twice keeps one entry (the first one)', async () => {
      const { store } = await fresh();
      const p = photo(2);
      await store.add(p, 1000);
      const again = await store.add(p, 5000);
      expect(again.addedAtMs).toBe(1000);
      expect(await store.countWaiting(CLUB)).toBe(1);
    });

    it('lists waiting photos oldest first, per club', async () => {
      const { store } = await fresh();
      const [a, b, c] = [photo(3), photo(4), photo(5, OTHER_CLUB)];
      await store.add(b, 2000);
      await store.add(a, 1000);
      await store.add(c, 500);
      expect((await store.waiting(CLUB)).map((e) => e.sha256)).toEqual([a.sha256, b.sha256]);
      expect((await store.waiting(OTHER_CLUB)).map((e) => e.sha256)).toEqual([c.sha256]);
    });

    it('keeps upload progress across a restart, and leaves bytes in place once uploaded', async () => {
      const { dbName, store } = await fresh();
      const p = photo(6);
      await store.add(p, 1000);
      await store.recordProgress(CLUB, p.sha256, { uploadId: UPLOAD, attempts: 2, lastError: 'no connection' });
      await store.close();
      const reopened = await open(dbName);
      expect(await reopened.get(CLUB, p.sha256)).toMatchObject({ uploadId: UPLOAD, attempts: 2, lastError: 'no connection' });
      await reopened.markUploaded(CLUB, p.sha256, 9000);
      expect(await reopened.get(CLUB, p.sha256)).toMatchObject({ state: 'uploaded', uploadId: null, uploadedAtMs: 9000, attempts: 0, lastError: null });
      expect(await reopened.countWaiting(CLUB)).toBe(0);
      expect(sha256Hex((await reopened.bytes(CLUB, p.sha256))!)).toBe(p.sha256);
    });

    it('a photo seen from the server is kept to show offline but never queued; taking it again needs no upload', async () => {
      const { store } = await fresh();
      const p = photo(7);
      await store.cacheDownloaded(p, 1000);
      expect(await store.countWaiting(CLUB)).toBe(0);
      expect((await store.get(CLUB, p.sha256))?.state).toBe('downloaded');
      expect((await store.add(p, 2000)).state).toBe('uploaded');
      expect(await store.countWaiting(CLUB)).toBe(0);
    });

    it('stores only the bytes of a view, not the whole buffer behind it', async () => {
      const { store } = await fresh();
      const big = photo(8, CLUB, 4000).data;
      const view = big.subarray(1000, 1500);
      const sha = sha256Hex(view);
      await store.add({ clubId: CLUB, sha256: sha, mimeType: 'image/jpeg', data: view }, 1);
      const back = (await store.bytes(CLUB, sha))!;
      expect(back.byteLength).toBe(500);
      expect(sha256Hex(back)).toBe(sha);
    });

    it('knows nothing of a photo it never had', async () => {
      const { store } = await fresh();
      expect(await store.get(CLUB, 'a'.repeat(64))).toBeNull();
      expect(await store.bytes(CLUB, 'a'.repeat(64))).toBeNull();
    });

    if (damage) {
      it('refuses a damaged queue entry rather than handing it to the app', async () => {
        const { dbName, store } = await fresh();
        const p = photo(9);
        await store.add(p, 1);
        await store.close();
        await damage(dbName, `${CLUB}/${p.sha256}`);
        const reopened = await open(dbName);
        await expect(reopened.waiting(CLUB)).rejects.toThrow();
      });
    }
  });
}
