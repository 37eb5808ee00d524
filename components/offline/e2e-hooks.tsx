import { useEffect, useRef } from 'react';
import { useMutate, useRecords, useSyncStatus } from '@/hooks/sync';
import { useAttachPhoto, usePhotoQueue } from '@/components/photos';
import type { CollectionName } from '@/shared/schemas';
import type { LoftlineE2E } from './e2e-api';

/*
 * Test builds only (EXPO_PUBLIC_LOFTLINE_E2E=1 at export time, set by tests/e2e/global-setup.ts): exposes the
 * app's own sync client and photo queue on window.__loftlineE2E so the offline browser test can make 50 edits
 * and attach 5 photos through exactly the code the screens use (useMutate, useAttachPhoto), without depending on
 * each form's layout. Production builds render nothing here and expose nothing.
 */

const ENABLED = process.env.EXPO_PUBLIC_LOFTLINE_E2E === '1';

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
    const hook: LoftlineE2E = {
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
    globalThis.__loftlineE2E = hook;
    return () => {
      globalThis.__loftlineE2E = undefined;
    };
  }, []);
  return null;
}

export function E2eHooks() {
  return ENABLED ? <Hooks /> : null;
}
