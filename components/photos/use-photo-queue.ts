import { useEffect, useState, useSyncExternalStore } from 'react';
import { useSession } from '@/hooks/auth/use-session';
import { useCurrentClub } from '@/hooks/use-current-club';
import type { PhotoQueue, PhotoQueueStatus } from '@/sync/photos';
import { photoQueueFor } from './photo-queues';

/** The upload queue of the current person and club (null until the photo store has opened, or signed out). */
export function usePhotoQueue(): PhotoQueue | null {
  const { user } = useSession();
  const { club } = useCurrentClub();
  const [queue, setQueue] = useState<PhotoQueue | null>(null);
  const userId = user?.id ?? null;
  const clubId = club?.id ?? null;
  useEffect(() => {
    if (!userId || !clubId) {
      setQueue(null);
      return;
    }
    let live = true;
    photoQueueFor(userId, clubId).then(
      (q) => live && setQueue(q),
      () => live && setQueue(null),
    );
    return () => {
      live = false;
    };
  }, [userId, clubId]);
  return queue;
}

const IDLE: PhotoQueueStatus = { waiting: 0, uploading: false, lastError: null };
const noop = () => () => undefined;

/** Live status of the queue: how many photos wait, whether one is uploading, why the last attempt failed. */
export function usePhotoQueueStatus(): PhotoQueueStatus {
  const queue = usePhotoQueue();
  return useSyncExternalStore(
    queue ? (l) => queue.subscribe(l) : noop,
    () => queue?.getStatus() ?? IDLE,
    () => IDLE,
  );
}

/** Photos taken on this device that the server has not confirmed yet (the sync indicator's "photos waiting"). */
export function usePendingPhotos(): number {
  return usePhotoQueueStatus().waiting;
}
