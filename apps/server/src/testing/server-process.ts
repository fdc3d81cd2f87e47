import { spawn, type ChildProcess } from 'node:child_process';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('../../../../', import.meta.url));

/** The compiled server `npm run build` leaves (plain JavaScript, run by node alone). */
export const COMPILED_MAIN = 'dist/server/main.js';

/**
 * Runs the real server as a child process on a data directory, for restart and kill tests: main.ts
 * through tsx, or with `compiled` the build in dist/server.
 */
export async function startServerProcess(env: Record<string, string>, { compiled = false } = {}): Promise<{ child: ChildProcess; baseUrl: string; output: () => string }> {
  const child = spawn(process.execPath, compiled ? [COMPILED_MAIN] : ['--import', 'tsx', 'apps/server/src/main.ts'], {
    cwd: root,
    env: { ...process.env, HOST: '127.0.0.1', DEMO_DATA: 'false', NODE_ENV: 'test', ...env },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let out = '';
  child.stdout!.on('data', (c: Buffer) => (out += c.toString()));
  child.stderr!.on('data', (c: Buffer) => (out += c.toString()));
  await new Promise<void>((resolve, reject) => {
    const timer = setTimeout(() => reject(new Error(`server did not start:\n${out}`)), 60_000);
    child.stdout!.on('data', () => {
      if (out.includes('ready in')) {
        clearTimeout(timer);
        resolve();
      }
    });
    child.on('exit', (code) => {
      clearTimeout(timer);
      reject(new Error(`server exited with ${code}:\n${out}`));
    });
  });
  return { child, baseUrl: `http://127.0.0.1:${env.PORT}`, output: () => out };
}

/** A minimal HTTP client with a cookie jar and the XSRF header, for talking to a server process. */
export class HttpSession {
  private cookies = new Map<string, string>();
  constructor(private readonly baseUrl: string) {}

  get cookieHeader() {
    return [...this.cookies].map(([k, v]) => `${k}=${v}`).join('; ');
  }

  async request(method: string, path: string, body?: unknown) {
    if (method !== 'GET' && !this.cookies.has('XSRF-TOKEN')) await this.request('GET', '/api/auth/me');
    const res = await fetch(this.baseUrl + path, {
      method,
      headers: {
        'content-type': 'application/json',
        cookie: this.cookieHeader,
        'x-xsrf-token': decodeURIComponent(this.cookies.get('XSRF-TOKEN') ?? ''),
      },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    for (const line of res.headers.getSetCookie()) {
      const [pair] = line.split(';');
      const i = pair.indexOf('=');
      this.cookies.set(pair.slice(0, i), pair.slice(i + 1));
    }
    const text = await res.text();
    return { status: res.status, body: text ? JSON.parse(text) : undefined };
  }
}
