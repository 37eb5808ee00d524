import { JPEG_QUALITY, type ResizedPhoto, fitWithin } from './resize-photo.types';

/**
 * Resizes on the phone before anything is stored, with a canvas: decode (honouring the camera's EXIF rotation),
 * draw at the reduced size, encode JPEG. Re-encoding also drops the EXIF block, GPS position included: the photo
 * record says where it belongs, the file need not.
 */
export async function resizePhoto(uri: string): Promise<ResizedPhoto> {
  const blob = await (await fetch(uri)).blob();
  const bitmap = await createImageBitmap(blob, { imageOrientation: 'from-image' });
  try {
    const { width, height } = fitWithin(bitmap.width, bitmap.height);
    const canvas = document.createElement('canvas');
    canvas.width = width;
    canvas.height = height;
    const ctx = canvas.getContext('2d');
    if (!ctx) throw new Error('this browser cannot draw images, so the photo cannot be resized');
    ctx.drawImage(bitmap, 0, 0, width, height);
    const out = await new Promise<Blob>((resolve, reject) =>
      canvas.toBlob((b) => (b ? resolve(b) : reject(new Error('the photo could not be encoded'))), 'image/jpeg', JPEG_QUALITY),
    );
    return { data: new Uint8Array(await out.arrayBuffer()), mimeType: 'image/jpeg', width, height };
  } finally {
    bitmap.close();
  }
}
