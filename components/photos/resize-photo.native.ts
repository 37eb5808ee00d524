import { SaveFormat, manipulateAsync } from 'expo-image-manipulator';
import { JPEG_QUALITY, MAX_EDGE_PX, type ResizedPhoto } from './resize-photo.types';

// Hermes provides atob (React Native 0.74 and later).
const base64ToBytes = (b64: string): Uint8Array => Uint8Array.from(atob(b64), (c) => c.charCodeAt(0));

/** Resizes on the phone with expo-image-manipulator (native builds): long edge at most MAX_EDGE_PX, JPEG. */
export async function resizePhoto(uri: string, size?: { width: number; height: number }): Promise<ResizedPhoto> {
  const landscape = !size || size.width >= size.height;
  const resize = landscape ? { width: Math.min(MAX_EDGE_PX, size?.width ?? MAX_EDGE_PX) } : { height: Math.min(MAX_EDGE_PX, size.height) };
  const r = await manipulateAsync(uri, [{ resize }], { compress: JPEG_QUALITY, format: SaveFormat.JPEG, base64: true });
  if (!r.base64) throw new Error('the photo could not be read after resizing');
  return { data: base64ToBytes(r.base64), mimeType: 'image/jpeg', width: r.width, height: r.height };
}
