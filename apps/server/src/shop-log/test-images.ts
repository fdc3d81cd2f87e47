import { crc32, deflateSync } from 'node:zlib';
import sharp from 'sharp';

/** Test images made on the spot (nothing downloaded): sharp for real ones, bytes by hand for hostile ones. */

/** A 64 × 48 JPEG with EXIF: camera, orientation 6 (turn 90° clockwise to view), and a GPS position. */
export async function jpegWithGps(): Promise<Buffer> {
  return sharp({ create: { width: 64, height: 48, channels: 3, background: { r: 150, g: 120, b: 80 } } })
    .jpeg()
    .withMetadata({ orientation: 6 })
    .withExif({
      IFD0: { Make: 'Workshop camera', Model: 'Test' },
      IFD3: { GPSLatitudeRef: 'N', GPSLatitude: '51/1 28/1 38/1', GPSLongitudeRef: 'W', GPSLongitude: '0/1 0/1 5/1' },
    })
    .toBuffer();
}

export const smallPng = () => sharp({ create: { width: 20, height: 10, channels: 4, background: '#336699' } }).png().toBuffer();
export const smallWebp = () => sharp({ create: { width: 20, height: 10, channels: 3, background: '#996633' } }).webp().toBuffer();
export const smallGif = () => sharp({ create: { width: 8, height: 8, channels: 3, background: '#000' } }).gif().toBuffer();

const chunk = (type: string, data: Buffer) => {
  const body = Buffer.concat([Buffer.from(type, 'latin1'), data]);
  const length = Buffer.alloc(4);
  length.writeUInt32BE(data.length);
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(body));
  return Buffer.concat([length, body, crc]);
};

/**
 * A valid PNG header that declares `width` × `height` pixels (8-bit grey) over a few bytes of
 * image data: a "pixel flood" (decompression bomb) a naive decoder would allocate for in full.
 * PNG layout per ISO/IEC 15948 (signature, IHDR, IDAT, IEND, CRC-32 per chunk).
 */
export function pngDeclaring(width: number, height: number): Buffer {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(width, 0);
  ihdr.writeUInt32BE(height, 4);
  ihdr.set([8, 0, 0, 0, 0], 8); // bit depth 8, greyscale, deflate, filter 0, no interlace
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', ihdr),
    chunk('IDAT', deflateSync(Buffer.alloc(width + 1))), // one row only
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

export const HTML_PAYLOAD = '<html><body><script>alert(document.cookie)</script></body></html>';
