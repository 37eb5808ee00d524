// The first bytes of a photo must match the type the phone declared, so the server never serves a file under an
// image type that is something else. Signatures: JPEG SOI marker FF D8 FF (ITU-T T.81 / JFIF), PNG's 8-byte
// signature (ISO/IEC 15948 §5.2), WebP's RIFF container with the "WEBP" form type (RFC 9649 §2).
import type { PhotoMimeType } from '../../../../shared/schemas';

const SIGNATURES: Record<PhotoMimeType, (b: Buffer) => boolean> = {
  'image/jpeg': (b) => b.length >= 3 && b[0] === 0xff && b[1] === 0xd8 && b[2] === 0xff,
  'image/png': (b) => b.length >= 8 && b.subarray(0, 8).equals(Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a])),
  'image/webp': (b) => b.length >= 12 && b.toString('latin1', 0, 4) === 'RIFF' && b.toString('latin1', 8, 12) === 'WEBP',
};

/** Bytes needed from the start of a file to recognise any accepted type. */
export const SIGNATURE_BYTES = 12;

export function matchesImageType(firstBytes: Buffer, mimeType: PhotoMimeType): boolean {
  return SIGNATURES[mimeType](firstBytes);
}
