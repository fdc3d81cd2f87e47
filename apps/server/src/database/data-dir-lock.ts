import fs from 'node:fs';
import path from 'node:path';

export const LOCK_FILE = 'barwright.lock';

export class DataDirBusyError extends Error {}

function isAlive(pid: number): boolean {
  try {
    process.kill(pid, 0);
    return true;
  } catch (error) {
    return (error as NodeJS.ErrnoException).code === 'EPERM';
  }
}

/**
 * Takes the data directory for this process. PGlite takes no lock of its own and two processes on
 * one directory corrupt it, so a lock file holding our PID is created atomically (`wx`); a lock
 * left by a process that no longer runs is stale and replaced. Returns the release function.
 */
export function lockDataDir(dataDir: string, log: (line: string) => void = () => {}): () => void {
  fs.mkdirSync(dataDir, { recursive: true });
  const file = path.join(dataDir, LOCK_FILE);
  for (let attempt = 0; attempt < 2; attempt++) {
    try {
      fs.writeFileSync(file, `${process.pid}\n`, { flag: 'wx' });
      return () => {
        try {
          if (fs.readFileSync(file, 'utf8').trim() === String(process.pid)) fs.unlinkSync(file);
        } catch {
          /* already gone */
        }
      };
    } catch (error) {
      if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
      const pid = Number.parseInt(fs.readFileSync(file, 'utf8'), 10);
      if (Number.isInteger(pid) && pid > 0 && pid !== process.pid && isAlive(pid)) {
        throw new DataDirBusyError(
          `The data directory ${dataDir} is in use by another Barwright process (PID ${pid}). ` +
            'Stop that process first, or set DATA_DIR to another directory.',
        );
      }
      log(`Removing a stale lock in ${dataDir} (PID ${Number.isNaN(pid) ? 'unknown' : pid} is not running).`);
      fs.rmSync(file, { force: true });
    }
  }
  throw new DataDirBusyError(`Could not lock the data directory ${dataDir}.`);
}
