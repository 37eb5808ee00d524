import * as ImagePicker from 'expo-image-picker';
import { useCallback, useState } from 'react';
import { photoFieldsSchema, type CollectionFields } from '@/shared/schemas';
import { useMutate } from '@/hooks/sync';
import { sha256Hex } from '@/sync/photos';
import { resizePhoto } from './resize-photo';
import { usePhotoQueue } from './use-photo-queue';

export type PhotoSubject = {
  siteId: string;
  subjectCollection: CollectionFields<'photos'>['subjectCollection'];
  subjectId: string;
};

export type PhotoSource = 'camera' | 'library';

export interface AttachPhoto {
  /** Takes or picks a photo, resizes it, keeps it on the device and records it. Resolves to the photo record id. */
  attach(subject: PhotoSubject, source: PhotoSource): Promise<string | null>;
  /** Keeps already-prepared bytes as a photo of `subject` (used after resizing, and by tests). */
  attachBytes(subject: PhotoSubject, photo: { data: Uint8Array; mimeType: 'image/jpeg' | 'image/png' | 'image/webp'; width: number | null; height: number | null; caption?: string }): Promise<string>;
  busy: boolean;
  error: string | null;
}

/**
 * Attach a photo to a support, hazard, operating position or site. The bytes are stored on the device first
 * (under their SHA-256, queued for upload), then the `photos` record is written through the sync outbox, so the
 * record never points at bytes the device does not have.
 */
export function useAttachPhoto(): AttachPhoto {
  const queue = usePhotoQueue();
  const mutate = useMutate();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  const attachBytes = useCallback<AttachPhoto['attachBytes']>(
    async (subject, photo) => {
      if (!queue) throw new Error('photos are not ready yet: sign in and choose a club');
      const sha256 = sha256Hex(photo.data);
      const fields = photoFieldsSchema.parse({
        ...subject,
        sha256,
        mimeType: photo.mimeType,
        bytes: photo.data.byteLength,
        width: photo.width,
        height: photo.height,
        caption: photo.caption ?? '',
        takenAt: new Date().toISOString(),
      });
      await queue.add({ clubId: queue.clubId, sha256, mimeType: photo.mimeType, data: photo.data });
      return mutate.create('photos', fields);
    },
    [queue, mutate],
  );

  const attach = useCallback<AttachPhoto['attach']>(
    async (subject, source) => {
      setError(null);
      setBusy(true);
      try {
        if (source === 'camera') {
          const permission = await ImagePicker.requestCameraPermissionsAsync();
          if (!permission.granted) {
            setError('Loftline may not use the camera. Allow it in the browser or phone settings, or choose a photo instead.');
            return null;
          }
        }
        const options: ImagePicker.ImagePickerOptions = { mediaTypes: 'images', quality: 1, exif: false };
        const result = source === 'camera' ? await ImagePicker.launchCameraAsync(options) : await ImagePicker.launchImageLibraryAsync(options);
        const asset = result.canceled ? null : result.assets[0];
        if (!asset) return null;
        const resized = await resizePhoto(asset.uri);
        return await attachBytes(subject, resized);
      } catch (err) {
        setError(err instanceof Error ? `The photo was not kept: ${err.message}` : 'The photo was not kept. Try again.');
        return null;
      } finally {
        setBusy(false);
      }
    },
    [attachBytes],
  );

  return { attach, attachBytes, busy, error };
}
