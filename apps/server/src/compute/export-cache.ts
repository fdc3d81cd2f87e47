import type { ExportedFile } from '@barwright/engine';

const sizeOf = (file: ExportedFile) => (typeof file.content === 'string' ? Buffer.byteLength(file.content) : file.content.byteLength);

/**
 * Finished exports of things that never change (a published revision), least recently used first
 * out, bounded by the bytes of their contents. Requests for a file being computed share its job.
 */
export class ExportCache {
  private readonly files = new Map<string, { file: ExportedFile; bytes: number }>();
  private readonly computing = new Map<string, Promise<ExportedFile>>();
  private bytes = 0;

  constructor(private readonly maxBytes: number) {}

  /** The cached file for `key`, or the one `compute` makes (kept when it fits). */
  async get(key: string, compute: () => Promise<ExportedFile>): Promise<ExportedFile> {
    const hit = this.files.get(key);
    if (hit) {
      this.files.delete(key); // re-inserted: a Map iterates in insertion order, so the first is the least recent
      this.files.set(key, hit);
      return hit.file;
    }
    const pending = this.computing.get(key);
    if (pending) return pending;
    const job = compute().finally(() => this.computing.delete(key));
    this.computing.set(key, job);
    const file = await job;
    this.keep(key, file);
    return file;
  }

  /** Bytes held. */
  get size(): number {
    return this.bytes;
  }

  private keep(key: string, file: ExportedFile): void {
    const bytes = sizeOf(file);
    if (bytes > this.maxBytes || this.files.has(key)) return;
    this.files.set(key, { file, bytes });
    this.bytes += bytes;
    for (const [oldest, entry] of this.files) {
      if (this.bytes <= this.maxBytes) break;
      this.files.delete(oldest);
      this.bytes -= entry.bytes;
    }
  }
}
