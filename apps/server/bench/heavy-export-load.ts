/**
 * /api/health latency with 20 heavy exports in flight: a demo member imports a design at the
 * contracts' complexity bounds and asks for 20 exports at once; /api/health is probed every 50 ms
 * until they are answered. Reports p95 and max of the probes and how the exports were answered.
 */
import { HEAVY_DESIGN } from '../src/compute/heavy-design';

async function signedIn(base: string, email: string, password: string) {
  const first = await fetch(`${base}/api/auth/me`);
  let cookies = first.headers.getSetCookie().map((c) => c.split(';')[0]);
  const xsrf = () => cookies.find((c) => c.startsWith('XSRF-TOKEN='))!.slice('XSRF-TOKEN='.length);
  const send = async (method: string, url: string, body?: object) => {
    const res = await fetch(`${base}${url}`, { method, headers: { 'content-type': 'application/json', 'x-xsrf-token': xsrf(), cookie: cookies.join('; ') }, body: body && JSON.stringify(body) });
    const set = res.headers.getSetCookie().map((c) => c.split(';')[0]);
    cookies = [...cookies.filter((c) => !set.some((s) => s.split('=')[0] === c.split('=')[0])), ...set];
    return res;
  };
  const res = await send('POST', '/api/auth/sign-in', { email, password });
  if (res.status !== 200) throw new Error(`sign-in answered ${res.status}`);
  return { send, cookie: () => cookies.join('; ') };
}

const percentile = (values: number[], p: number) => [...values].sort((a, b) => a - b)[Math.min(values.length - 1, Math.ceil((p / 100) * values.length) - 1)];

export async function healthUnderHeavyExports(base: string, email: string, password: string) {
  const user = await signedIn(base, email, password);
  const board = await (await user.send('POST', '/api/boards', { name: 'Bench' })).json();
  const design = await (await user.send('POST', `/api/boards/${board.id}/designs`, { title: 'Heavy', file: HEAVY_DESIGN })).json();
  const formats = ['svg', 'dxf', 'gcode', 'pdf'];
  let running = true;
  const exports = Promise.all(
    Array.from({ length: 20 }, (_, i) => fetch(`${base}/api/designs/${design.id}/export?format=${formats[i % 4]}`, { headers: { cookie: user.cookie() } }).then(async (r) => (await r.arrayBuffer(), r.status))),
  ).finally(() => (running = false));
  const probes: number[] = [];
  while (running) {
    const started = performance.now();
    await (await fetch(`${base}/api/health`)).json();
    probes.push(performance.now() - started);
    await new Promise((r) => setTimeout(r, 50));
  }
  const statuses = await exports;
  const count = (s: number) => statuses.filter((x) => x === s).length;
  // The first probes meet the 20 requests' own arrival (session and database reads on the request thread).
  const settled = probes.slice(Math.min(probes.length - 1, 20));
  return { p95: percentile(probes, 95), max: Math.max(...probes), settledP95: percentile(settled, 95), probes: probes.length, ok: count(200), busy: count(503), other: statuses.length - count(200) - count(503) };
}
