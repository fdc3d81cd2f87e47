import sharp, { type Sharp } from 'sharp';
import { fileTypeFromBuffer } from 'file-type';
import { PHOTO_THUMB_PX, PHOTO_TYPES } from '@barwright/contracts';
import { HttpError } from '../http/http-error';

export type PhotoMime = (typeof PHOTO_TYPES)[number];

export interface ProcessedPhoto {
  mime: PhotoMime;
  extension: 'jpg' | 'png' | 'webp';
  full: Buffer;
  thumb: Buffer;
  width: number;
  height: number;
}

const EXTENSIONS: Record<PhotoMime, ProcessedPhoto['extension']> = { 'image/jpeg': 'jpg', 'image/png': 'png', 'image/webp': 'webp' };
const SHARP_FORMATS: Record<PhotoMime, string> = { 'image/jpeg': 'jpeg', 'image/png': 'png', 'image/webp': 'webp' };

const unreadable = () => new HttpError(422, 'unreadable_image', 'The image could not be read; it may be damaged. Export it again as JPEG, PNG or WebP.');

/** Encodes in the upload's own format; sharp writes no metadata unless asked, so EXIF, GPS, XMP and comments are gone. */
function encode(image: Sharp, mime: PhotoMime): Sharp {
  if (mime === 'image/jpeg') return image.jpeg({ quality: 85, mozjpeg: true });
  if (mime === 'image/png') return image.png({ compressionLevel: 9 });
  return image.webp({ quality: 85 });
}

/**
 * Checks an upload by its content and re-encodes it:
 * - the type comes from the file's signature (file-type), and sharp must read the same format;
 * - the declared size is checked from the header before any pixel is decoded (a small file can
 *   declare a huge image), and sharp's own pixel limit stands guard while decoding;
 * - the image is turned upright from its EXIF orientation, then re-encoded from pixels, so
 *   anything riding along (appended HTML or script, metadata, GPS) is not in the stored file.
 */
export async function processPhoto(upload: Buffer, maxPixels: number): Promise<ProcessedPhoto> {
  const type = await fileTypeFromBuffer(upload);
  const mime = PHOTO_TYPES.find((t) => t === type?.mime);
  if (!mime) throw new HttpError(415, 'unsupported_type', `The file is not a JPEG, PNG or WebP image (judged by its content${type ? `, which is ${type.mime}` : ''}).`);
  const header = await sharp(upload, { limitInputPixels: false }).metadata().catch(() => {
    throw unreadable();
  });
  if (header.format !== SHARP_FORMATS[mime]) throw unreadable();
  const pixels = (header.width ?? 0) * (header.height ?? 0);
  if (pixels > maxPixels) {
    throw new HttpError(422, 'too_many_pixels', `The image is ${header.width} × ${header.height} pixels; the limit is ${Math.round(maxPixels / 1e6)} megapixels. Scale it down and try again.`);
  }
  try {
    const { data: full, info } = await encode(sharp(upload, { limitInputPixels: maxPixels, failOn: 'error' }).rotate(), mime).toBuffer({ resolveWithObject: true });
    const thumb = await encode(sharp(full).resize({ width: PHOTO_THUMB_PX, height: PHOTO_THUMB_PX, fit: 'inside', withoutEnlargement: true }), mime).toBuffer();
    return { mime, extension: EXTENSIONS[mime], full, thumb, width: info.width, height: info.height };
  } catch {
    throw unreadable();
  }
}
