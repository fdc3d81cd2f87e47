import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { spawn } from 'node:child_process';
import { describe, expect, it } from 'vitest';
import { DataDirBusyError, LOCK_FILE, lockDataDir } from './data-dir-lock';

const tempDir = () => fs.mkdtempSync(path.join(os.tmpdir(), 'bw-lock-'));

describe('data directory lock', () => {
  it('creates the directory, writes our PID and removes the lock on release', () => {
    const dir = path.join(tempDir(), 'nested', 'data');
    const release = lockDataDir(dir);
    expect(fs.readFileSync(path.join(dir, LOCK_FILE), 'utf8').trim()).toBe(String(process.pid));
    release();
    expect(fs.existsSync(path.join(dir, LOCK_FILE))).toBe(false);
  });

  it('refuses a directory held by a running process, naming its PID', async () => {
    const dir = tempDir();
    const child = spawn(process.execPath, ['-e', 'setTimeout(() => {}, 20000)']);
    try {
      fs.writeFileSync(path.join(dir, LOCK_FILE), `${child.pid}\n`);
      expect(() => lockDataDir(dir)).toThrow(DataDirBusyError);
      expect(() => lockDataDir(dir)).toThrow(new RegExp(`PID ${child.pid}`));
    } finally {
      child.kill();
    }
  });

  it('replaces a stale lock left by a process that has ended', async () => {
    const dir = tempDir();
    const child = spawn(process.execPath, ['-e', '0']);
    await new Promise((r) => child.on('exit', r));
    fs.writeFileSync(path.join(dir, LOCK_FILE), `${child.pid}\n`);
    const lines: string[] = [];
    const release = lockDataDir(dir, (l) => lines.push(l));
    expect(lines.join()).toMatch(/stale/);
    release();
  });
});
