import { useEffect, useState } from 'react';
import { Platform } from 'react-native';
import { PhotoApiError, loadPhotoBytes } from '@/sync/photos';
import { usePhotoQueue } from './use-photo-queue';

export type PhotoImage =
  | { state: 'loading' }
  /** On the device or fetched from the server: ready to show. */
  | { state: 'ready'; uri: string }
  /** Taken on another device that has not uploaded it yet. */
  | { state: 'elsewhere' }
  /** Not on this device and no connection to fetch it. */
  | { state: 'offline' }
  | { state: 'failed'; message: string };

function toUri(data: Uint8Array, mimeType: string): { uri: string; release: () => void } {
  if (Platform.OS === 'web') {
    const uri = URL.createObjectURL(new Blob([data as BlobPart], { type: mimeType }));
    return { uri, release: () => URL.revokeObjectURL(uri) };
  }
  let s = '';
  for (let i = 0; i < data.length; i += 0x8000) s += String.fromCharCode(...data.subarray(i, i + 0x8000));
  return { uri: `data:${mimeType};base64,${btoa(s)}`, release: () => undefined };
}

/** An image address for a photo: the device's copy, or the server's (kept afterwards to show offline). */
export function usePhotoImage(sha256: string, mimeType: 'image/jpeg' | 'image/png' | 'image/webp'): PhotoImage {
  const queue = usePhotoQueue();
  const [image, setImage] = useState<PhotoImage>({ state: 'loading' });
  useEffect(() => {
    if (!queue) return;
    let live = true;
    let release = () => undefined as void;
    loadPhotoBytes(queue.store, queue.api, queue.clubId, sha256, mimeType).then(
      (data) => {
        if (!live) return;
        if (!data) return setImage({ state: 'elsewhere' });
        const made = toUri(data, mimeType);
        release = made.release;
        setImage({ state: 'ready', uri: made.uri });
      },
      (err: unknown) => {
        if (!live) return;
        if (err instanceof PhotoApiError && err.code === 'offline') setImage({ state: 'offline' });
        else setImage({ state: 'failed', message: err instanceof Error ? err.message : 'could not load the photo' });
      },
    );
    return () => {
      live = false;
      release();
    };
  }, [queue, sha256, mimeType]);
  return image;
}

/** Whether this device still has the photo waiting to upload (re-read whenever the queue changes). */
export function usePhotoWaiting(sha256: string): boolean {
  const queue = usePhotoQueue();
  const [waiting, setWaiting] = useState(false);
  useEffect(() => {
    if (!queue) return;
    let live = true;
    const check = () => {
      void queue.store.get(queue.clubId, sha256).then((e) => live && setWaiting(e?.state === 'waiting'));
    };
    check();
    const off = queue.subscribe(check);
    return () => {
      live = false;
      off();
    };
  }, [queue, sha256]);
  return waiting;
}
