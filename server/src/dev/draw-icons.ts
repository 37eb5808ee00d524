// Draws Loftline's app icon and favicon as PNG files (no image tools needed): the mark from
// components/ui/icon.tsx ("logo"), white strokes on a throw-line orange rounded square, 4×4 supersampled.
// Run: npx tsx --tsconfig server/tsconfig.json server/src/dev/draw-icons.ts
import { writeFileSync } from 'node:fs';
import path from 'node:path';
import { deflateSync } from 'node:zlib';

type Pt = [number, number];
const BG: [number, number, number] = [0xe0, 0x57, 0x0f];
const FG: [number, number, number] = [0xff, 0xff, 0xff];

/** The mark on the 24-unit grid, scaled to 80 % about the centre as in the SVG: polylines with a stroke width. */
function markSegments(): Pt[][] {
  const q = (a: Pt, c: Pt, b: Pt, n = 24): Pt[] =>
    Array.from({ length: n + 1 }, (_, i) => {
      const t = i / n;
      return [(1 - t) ** 2 * a[0] + 2 * (1 - t) * t * c[0] + t * t * b[0], (1 - t) ** 2 * a[1] + 2 * (1 - t) * t * c[1] + t * t * b[1]];
    });
  const lines: Pt[][] = [
    [[5, 21], [5, 4]],
    [[19, 21], [19, 9]],
    q([5, 5], [12, 13], [19, 10]),
    [[2, 21], [22, 21]],
  ];
  return lines.map((l) => l.map(([x, y]) => [2.4 + x * 0.8, 2.4 + y * 0.8] as Pt));
}

function distToSegment(p: Pt, a: Pt, b: Pt): number {
  const dx = b[0] - a[0];
  const dy = b[1] - a[1];
  const len2 = dx * dx + dy * dy;
  const t = len2 === 0 ? 0 : Math.max(0, Math.min(1, ((p[0] - a[0]) * dx + (p[1] - a[1]) * dy) / len2));
  return Math.hypot(p[0] - (a[0] + t * dx), p[1] - (a[1] + t * dy));
}

function insideRoundRect(x: number, y: number, size: number, r: number): boolean {
  const cx = Math.min(Math.max(x, r), size - r);
  const cy = Math.min(Math.max(y, r), size - r);
  return Math.hypot(x - cx, y - cy) <= r;
}

function draw(sizePx: number): Buffer {
  const segs = markSegments();
  const half = (2.4 * 0.8) / 2;
  const rgba = Buffer.alloc(sizePx * sizePx * 4);
  const S = 4;
  for (let py = 0; py < sizePx; py++) {
    for (let px = 0; px < sizePx; px++) {
      let bg = 0;
      let fg = 0;
      for (let sy = 0; sy < S; sy++) {
        for (let sx = 0; sx < S; sx++) {
          const x = ((px + (sx + 0.5) / S) / sizePx) * 24;
          const y = ((py + (sy + 0.5) / S) / sizePx) * 24;
          if (!insideRoundRect(x, y, 24, 5)) continue;
          bg++;
          const p: Pt = [x, y];
          if (segs.some((l) => l.some((a, i) => i > 0 && distToSegment(p, l[i - 1], a) <= half))) fg++;
        }
      }
      const o = (py * sizePx + px) * 4;
      const f = bg === 0 ? 0 : fg / bg;
      for (let c = 0; c < 3; c++) rgba[o + c] = Math.round(BG[c] * (1 - f) + FG[c] * f);
      rgba[o + 3] = Math.round((bg / (S * S)) * 255);
    }
  }
  return png(sizePx, sizePx, rgba);
}

// PNG (ISO/IEC 15948): signature, IHDR, IDAT (zlib of filter-0 scanlines), IEND, each chunk with its CRC-32.
const CRC_TABLE = Array.from({ length: 256 }, (_, n) => {
  let c = n;
  for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  return c >>> 0;
});
function crc32(buf: Buffer): number {
  let c = 0xffffffff;
  for (const b of buf) c = CRC_TABLE[(c ^ b) & 0xff] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}
function chunk(type: string, data: Buffer): Buffer {
  const len = Buffer.alloc(4);
  len.writeUInt32BE(data.length);
  const td = Buffer.concat([Buffer.from(type, 'ascii'), data]);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(td));
  return Buffer.concat([len, td, crc]);
}
function png(w: number, h: number, rgba: Buffer): Buffer {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(w, 0);
  ihdr.writeUInt32BE(h, 4);
  ihdr[8] = 8; // bit depth
  ihdr[9] = 6; // RGBA
  const raw = Buffer.alloc((w * 4 + 1) * h);
  for (let y = 0; y < h; y++) rgba.copy(raw, y * (w * 4 + 1) + 1, y * w * 4, (y + 1) * w * 4);
  return Buffer.concat([Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]), chunk('IHDR', ihdr), chunk('IDAT', deflateSync(raw)), chunk('IEND', Buffer.alloc(0))]);
}

if (require.main === module) {
  const out = path.resolve(__dirname, '../../../assets/images');
  for (const [name, size] of [['icon.png', 1024], ['favicon.png', 48]] as const) {
    writeFileSync(path.join(out, name), draw(size));
    console.log(`wrote assets/images/${name} (${size}×${size})`);
  }
}
