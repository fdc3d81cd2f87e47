/**
 * One start of a server process, measured from outside: spawn to `/api/health/ready` answering 200
 * (what a balancer or a user waits for), then resident memory while idle and its peak so far (the
 * kernel's VmRSS and VmHWM in /proc, so Linux only; undefined elsewhere).
 */
import fs from 'node:fs';
import { spawn } from 'node:child_process';

export interface StartFigures {
  readyMs: number;
  /** Resident set after `idleMs` of quiet once ready. */
  idleRssMb?: number;
  /** The process's highest resident set so far (a new data directory's initdb included). */
  peakRssMb?: number;
  /** Sends SIGTERM and waits for the exit. */
  stop(): Promise<void>;
  pid: number;
}

function procStatusMb(pid: number, field: 'VmRSS' | 'VmHWM'): number | undefined {
  try {
    const line = fs.readFileSync(`/proc/${pid}/status`, 'utf8').split('\n').find((l) => l.startsWith(field + ':'));
    return line ? Number(line.split(/\s+/)[1]) / 1024 : undefined;
  } catch {
    return undefined;
  }
}

/** Resident memory of a running process, MB (VmRSS), or undefined off Linux. */
export const residentMb = (pid: number) => procStatusMb(pid, 'VmRSS');

export async function measureStart(opts: { cwd: string; args: string[]; env: Record<string, string>; port: number; idleMs?: number; timeoutMs?: number }): Promise<StartFigures> {
  const started = performance.now();
  const child = spawn(process.execPath, opts.args, { cwd: opts.cwd, env: { ...process.env, ...opts.env, PORT: String(opts.port), HOST: '127.0.0.1' }, stdio: ['ignore', 'ignore', 'inherit'] });
  const exited = new Promise<void>((resolve) => child.on('exit', () => resolve()));
  let gone = false;
  void exited.then(() => (gone = true));
  const deadline = started + (opts.timeoutMs ?? 120_000);
  for (;;) {
    if (gone) throw new Error(`server exited before it was ready (${opts.args.join(' ')})`);
    if (performance.now() > deadline) {
      child.kill('SIGKILL');
      throw new Error('server not ready in time');
    }
    const ok = await fetch(`http://127.0.0.1:${opts.port}/api/health/ready`).then((r) => r.status === 200, () => false);
    if (ok) break;
    await new Promise((r) => setTimeout(r, 25));
  }
  const readyMs = performance.now() - started;
  await new Promise((r) => setTimeout(r, opts.idleMs ?? 3000));
  const pid = child.pid!;
  return {
    readyMs,
    pid,
    idleRssMb: procStatusMb(pid, 'VmRSS'),
    peakRssMb: procStatusMb(pid, 'VmHWM'),
    stop: async () => {
      child.kill('SIGTERM');
      await exited;
    },
  };
}
