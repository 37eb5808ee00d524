/** A photo made ready to keep: re-encoded as JPEG, at most MAX_EDGE_PX on its long side. */
export interface ResizedPhoto {
  data: Uint8Array;
  mimeType: 'image/jpeg';
  width: number;
  height: number;
}

/**
 * 1600 px on the long side shows a tree's crown and a line's insulators on any phone screen, and keeps a photo
 * near 300 kB: a scout's 50 photos fit in a few phone-signal minutes of upload. Quality 0.82 is common practice
 * for JPEG photos (little visible loss, about a third the size of 0.95).
 */
export const MAX_EDGE_PX = 1600;
export const JPEG_QUALITY = 0.82;

export function fitWithin(width: number, height: number, maxEdgePx = MAX_EDGE_PX): { width: number; height: number } {
  const scale = Math.min(1, maxEdgePx / Math.max(width, height));
  return { width: Math.max(1, Math.round(width * scale)), height: Math.max(1, Math.round(height * scale)) };
}
