import fs from 'node:fs/promises';
import path from 'node:path';
import { randomUUID } from 'node:crypto';

/**
 * Photo files under `<uploads>/photos/`, named by the server (a random UUID), never by the
 * upload. The uploads directory lies outside the web root; files are only served through the
 * photo routes, which check access first.
 */
export class PhotoFiles {
  constructor(private readonly uploadsDir: string) {}

  /** The folder the files live in (the root `sendFile` resolves names against). */
  get dir() {
    return path.join(this.uploadsDir, 'photos');
  }

  /** Writes both files (each through a temporary name and a rename, so no half file is ever served). */
  async save(extension: string, full: Buffer, thumb: Buffer): Promise<{ fileName: string; thumbName: string }> {
    await fs.mkdir(this.dir, { recursive: true });
    const base = randomUUID();
    const fileName = `${base}.${extension}`;
    const thumbName = `${base}-thumb.${extension}`;
    await this.write(fileName, full);
    await this.write(thumbName, thumb);
    return { fileName, thumbName };
  }

  private async write(name: string, data: Buffer) {
    const target = this.pathOf(name);
    const temporary = `${target}.${process.pid}.part`;
    await fs.writeFile(temporary, data, { mode: 0o640 });
    await fs.rename(temporary, target);
  }

  /** The absolute path of a stored file; names come from the database, and are checked again here. */
  pathOf(name: string): string {
    if (!/^[0-9a-f-]{36}(-thumb)?\.(jpg|png|webp)$/.test(name)) throw new Error(`not a stored photo name: ${name}`);
    return path.join(this.dir, name);
  }

  async remove(...names: string[]): Promise<void> {
    await Promise.all(names.map((n) => fs.rm(this.pathOf(n), { force: true })));
  }
}
