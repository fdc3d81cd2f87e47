import fsp from 'node:fs/promises';
import path from 'node:path';
import { randomUUID } from 'node:crypto';
import { namesFor, requireStoredName, type PhotoStorage, type StoredPhoto } from './photo-storage';

/**
 * Photo files under `<uploads>/photos/` on the local disk: the default, for one process. The
 * uploads directory lies outside the web root.
 */
export class PhotoFiles implements PhotoStorage {
  constructor(private readonly uploadsDir: string) {}

  get description() {
    return `folder ${this.dir}`;
  }

  /** The folder the files live in. */
  get dir() {
    return path.join(this.uploadsDir, 'photos');
  }

  /** Writes both files (each through a temporary name and a rename, so no half file is ever served). */
  async save(extension: string, full: Buffer, thumb: Buffer): Promise<{ fileName: string; thumbName: string }> {
    await fsp.mkdir(this.dir, { recursive: true });
    const names = namesFor(randomUUID(), extension);
    await this.write(names.fileName, full);
    await this.write(names.thumbName, thumb);
    return names;
  }

  private async write(name: string, data: Buffer) {
    const target = this.pathOf(name);
    const temporary = `${target}.${process.pid}.part`;
    await fsp.writeFile(temporary, data, { mode: 0o640 });
    await fsp.rename(temporary, target);
  }

  async read(name: string): Promise<StoredPhoto | undefined> {
    const file = this.pathOf(name);
    try {
      const handle = await fsp.open(file, 'r');
      const { size } = await handle.stat();
      return { body: handle.createReadStream(), bytes: size };
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code === 'ENOENT') return undefined;
      throw error;
    }
  }

  /** The absolute path of a stored file; names come from the database, and are checked again here. */
  pathOf(name: string): string {
    return path.join(this.dir, requireStoredName(name));
  }

  async remove(...names: string[]): Promise<void> {
    await Promise.all(names.map((n) => fsp.rm(this.pathOf(n), { force: true })));
  }
}

