import type { PhotoApi } from './photo-api';
import type { PhotoStore } from './types';

/**
 * A photo's bytes for showing it: the device's own copy when it has one, else fetched from the server once and
 * kept (as "downloaded") so it shows offline next time. null when neither has it (not uploaded yet by the
 * device that took it).
 */
export async function loadPhotoBytes(
  store: PhotoStore,
  api: PhotoApi,
  clubId: string,
  sha256: string,
  mimeType: 'image/jpeg' | 'image/png' | 'image/webp',
  now: () => number = Date.now,
): Promise<Uint8Array | null> {
  const local = await store.bytes(clubId, sha256);
  if (local) return local;
  if (!(await api.has(sha256))) return null;
  const { data } = await api.download(sha256);
  await store.cacheDownloaded({ clubId, sha256, mimeType, data }, now());
  return data;
}
