import { useEffect, useRef } from 'react';
import { useMutate, useRecords, useSyncStatus } from '@/hooks/sync';
import { type PhotoSubject, useAttachPhoto, usePhotoQueue } from '@/components/photos';
import type { CollectionName } from '@/shared/schemas';

/*
 * Test builds only (EXPO_PUBLIC_LOFTLINE_E2E=1 at export time, set by tests/e2e/global-setup.ts): exposes the
 * app's own sync client and photo queue on window.__loftlineE2E so the offline browser test can make 50 edits
 * and attach 5 photos through exactly the code the screens use (useMutate, useAttachPhoto), without depending on
 * each form's layout. Production builds render nothing here and expose nothing.
 */

const ENABLED = process.env.EXPO_PUBLIC_LOFTLINE_E2E === '1';

export interface LoftlineE2E {
  create(collection: CollectionName, fields: Record<string, unknown>): Promise<string>;
  update(collection: CollectionName, id: string, fields: Record<string, unknown>): Promise<void>;
  /** Attaches a photo given as base64 bytes; resolves to the photos record id. */
  attachPhoto(subject: PhotoSubject, base64: string, mimeType: 'image/jpeg' | 'image/png'): Promise<string>;
  records(collection: CollectionName): unknown[];
  status(): unknown;
  photosWaiting(): Promise<number>;
}

declare global {
  // eslint-disable-next-line no-var
  var __loftlineE2E: LoftlineE2E | undefined;
}

const TRACKED: CollectionName[] = ['supports', 'photos'];

function Hooks() {
  const mutate = useMutate();
  const { attachBytes } = useAttachPhoto();
  const queue = usePhotoQueue();
  const status = useSyncStatus();
  const supports = useRecords('supports');
  const photos = useRecords('photos');
  const live = useRef({ mutate, attachBytes, queue, status, records: { supports, photos } as Record<string, unknown> });
  live.current = { mutate, attachBytes, queue, status, records: { supports, photos } };
  useEffect(() => {
    globalThis.__loftlineE2E = {
      create: (c, f) => live.current.mutate.create(c, f as never),
      update: async (c, id, f) => void (await live.current.mutate.update(c, id, f as never)),
      attachPhoto: (subject, base64, mimeType) =>
        live.current.attachBytes(subject, { data: Uint8Array.from(atob(base64), (ch) => ch.charCodeAt(0)), mimeType, width: null, height: null }),
      records: (c) => {
        if (!TRACKED.includes(c)) throw new Error(`the test hook tracks only ${TRACKED.join(', ')}`);
        return (live.current.records[c] as unknown[] | undefined) ?? [];
      },
      status: () => live.current.status,
      photosWaiting: async () => (live.current.queue ? live.current.queue.store.countWaiting(live.current.queue.clubId) : -1),
    };
    return () => {
      globalThis.__loftlineE2E = undefined;
    };
  }, []);
  return null;
}

export function E2eHooks() {
  return ENABLED ? <Hooks /> : null;
}
