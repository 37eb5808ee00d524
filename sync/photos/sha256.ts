import { sha256 } from '@noble/hashes/sha2';
import { bytesToHex } from '@noble/hashes/utils';

/**
 * SHA-256 of a photo's bytes as 64 lowercase hex digits (FIPS 180-4), the name it is stored and uploaded under.
 * Pure JavaScript (@noble/hashes) rather than crypto.subtle: the browser only offers crypto.subtle on secure
 * origins, and a club laptop serving the app at http://192.168.x.y on a field-day LAN is not one.
 */
export function sha256Hex(data: Uint8Array): string {
  return bytesToHex(sha256(data));
}
