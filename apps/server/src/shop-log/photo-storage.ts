import type { Readable } from 'node:stream';

/** A stored photo opened for reading: its bytes as a stream, and how many there are. */
export interface StoredPhoto {
  body: Readable;
  bytes: number;
}

/**
 * Where photo files live: a local folder (one process, the default) or an S3-compatible bucket
 * (several instances). Files are named by the server (a random UUID), never by the upload; they
 * are only ever served through the photo routes, which check access first.
 */
export interface PhotoStorage {
  /** Said in the start-up log. */
  readonly description: string;
  /** Stores the full image and its thumbnail; neither is visible under its name until wholly written. */
  save(extension: string, full: Buffer, thumb: Buffer): Promise<{ fileName: string; thumbName: string }>;
  /** The stored file, or undefined when it is not there. */
  read(name: string): Promise<StoredPhoto | undefined>;
  remove(...names: string[]): Promise<void>;
}

const STORED_NAME = /^[0-9a-f-]{36}(-thumb)?\.(jpg|png|webp)$/;

/** Names come from the database; each storage checks them again before touching a file or key. */
export function requireStoredName(name: string): string {
  if (!STORED_NAME.test(name)) throw new Error(`not a stored photo name: ${name}`);
  return name;
}

/** The two names one upload is stored under. */
export function namesFor(base: string, extension: string) {
  return { fileName: `${base}.${extension}`, thumbName: `${base}-thumb.${extension}` };
}

/** The Content-Type a stored name is written with (the name's extension is ours, from the decoded content). */
export function mimeOfStoredName(name: string): string {
  const extension = requireStoredName(name).split('.').pop();
  return extension === 'jpg' ? 'image/jpeg' : `image/${extension}`;
}
