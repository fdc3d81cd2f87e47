import { HttpEventType, type HttpEvent } from '@angular/common/http';
import { PHOTO_MAX_BYTES, PHOTO_TYPES } from '@barwright/contracts';
import { ApiError } from '../../core/http/api-error';

/** Where an upload stands: bytes sent so far (0–1, null when the size is unknown), or the server's answer. */
export type UploadStep<T> = { kind: 'sending'; fraction: number | null } | { kind: 'done'; body: T };

/** Reads one HttpClient event of an upload made with `reportProgress` (pure); other events say nothing. */
export function uploadStep<T>(event: HttpEvent<T>): UploadStep<T> | null {
  if (event.type === HttpEventType.UploadProgress) {
    return { kind: 'sending', fraction: event.total ? Math.min(1, event.loaded / event.total) : null };
  }
  if (event.type === HttpEventType.Response && event.body !== null) return { kind: 'done', body: event.body };
  return null;
}

/**
 * A reason to refuse the file before sending it, in the server's own terms (it checks again, by the
 * content, not by the name): too large, or not announced as an image type the shop log takes.
 */
export function fileProblem(file: { size: number; type: string }): string | null {
  if (file.size > PHOTO_MAX_BYTES) return `The file is ${(file.size / 1024 / 1024).toFixed(1)} MB; the limit is ${PHOTO_MAX_BYTES / 1024 / 1024} MB.`;
  if (file.type && !(PHOTO_TYPES as readonly string[]).includes(file.type)) return 'Choose a JPEG, PNG or WebP photo.';
  return null;
}

/** What to say when the server refused the upload: its own message for size, type, pixels and the day's count. */
export function uploadRefusal(error: unknown): string {
  if (!(error instanceof ApiError)) throw error;
  if (error.status === 0) return 'The upload did not reach the server. Check the connection and try again.';
  if (error.status === 401 || (error.status >= 500 && error.status !== 503)) throw error;
  const fields = Object.entries(error.fields);
  if (error.code === 'invalid_input' && fields.length > 0) return fields.map(([k, v]) => `${k === 'photo' ? 'Photo' : k[0].toUpperCase() + k.slice(1)} ${v}`).join('. ') + '.';
  return error.message;
}
