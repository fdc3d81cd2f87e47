// `npm run cluster`: the deployment shape on this machine. Two compiled server instances on the
// local PostgreSQL and Redis, photos in a local fake S3 (s3rver), behind a round-robin proxy
// (http-proxy, WebSocket upgrades included) that sends traffic only to instances whose
// /api/health/ready answers 200. Prints the one URL to open; Ctrl-C stops everything.
//
// Settings (environment): PORT (the proxy, 3100), DATABASE_URL (postgres://postgres@127.0.0.1:5432/barwright_cluster,
// created when missing), REDIS_URL (redis://127.0.0.1:6379). State lives in .tmp/cluster/.
import fs from 'node:fs';
import http from 'node:http';
import path from 'node:path';
import { randomBytes } from 'node:crypto';
import { spawn } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import httpProxy from 'http-proxy';
import pg from 'pg';
import S3rver from 's3rver';
import { buildParts } from './build.mjs';

const root = fileURLToPath(new URL('..', import.meta.url));
const state = path.join(root, '.tmp/cluster');
const port = Number(process.env.PORT ?? 3100);
const databaseUrl = process.env.DATABASE_URL ?? 'postgres://postgres@127.0.0.1:5432/barwright_cluster';
const redisUrl = process.env.REDIS_URL ?? 'redis://127.0.0.1:6379';
const publicUrl = `http://localhost:${port}`;
const say = (line) => console.log(`[cluster] ${line}`);
/** The running instances, so a failed start stops the ones already up. */
const children = [];

/** Creates the cluster's database on the server when it is not there yet. */
async function ensureDatabase(url) {
  const target = new URL(url);
  const name = decodeURIComponent(target.pathname.slice(1));
  const admin = new URL(url);
  admin.pathname = '/postgres';
  const client = new pg.Client({ connectionString: admin.toString(), connectionTimeoutMillis: 3000 });
  await client.connect();
  try {
    const { rowCount } = await client.query('select 1 from pg_database where datname = $1', [name]);
    if (!rowCount) await client.query(`create database "${name.replaceAll('"', '""')}"`);
  } finally {
    await client.end();
  }
}

/** The session secret both instances sign cookies with (made once, kept in .tmp/cluster). */
function sessionSecret() {
  const file = path.join(state, 'session-secret');
  if (!fs.existsSync(file)) fs.writeFileSync(file, randomBytes(32).toString('base64url'), { mode: 0o600 });
  return fs.readFileSync(file, 'utf8').trim();
}

/** Starts one compiled instance; resolves once it says it is ready. */
function startInstance(name, instancePort, env) {
  const child = spawn(process.execPath, [path.join(root, 'dist/server/main.js')], {
    cwd: root,
    env: { ...process.env, ...env, PORT: String(instancePort), HOST: '127.0.0.1', DATA_DIR: path.join(state, name) },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  return new Promise((resolve, reject) => {
    let ready = false;
    const relay = (stream, out) => {
      let rest = '';
      stream.on('data', (chunk) => {
        const lines = (rest + chunk).split('\n');
        rest = lines.pop();
        for (const line of lines) {
          out.write(`[${name}] ${line}\n`);
          if (!ready && line.includes('ready in')) {
            ready = true;
            resolve(child);
          }
        }
      });
    };
    relay(child.stdout, process.stdout);
    relay(child.stderr, process.stderr);
    child.on('exit', (code) => {
      if (!ready) reject(new Error(`instance ${name} exited with ${code} before it was ready`));
      else say(`instance ${name} exited with ${code}`);
    });
  });
}

/** Round robin over the instances whose readiness answered 200 at the last look (every second). */
function startProxy(targets) {
  const ready = new Set();
  const look = () =>
    Promise.all(
      targets.map(async (t) => {
        const ok = await fetch(`${t}/api/health/ready`, { signal: AbortSignal.timeout(2500) }).then((r) => r.ok, () => false);
        if (ok) ready.add(t);
        else ready.delete(t);
      }),
    );
  const timer = setInterval(look, 1000);
  let turn = 0;
  const next = () => {
    const alive = targets.filter((t) => ready.has(t));
    return alive.length ? alive[turn++ % alive.length] : undefined;
  };
  const proxy = httpProxy.createProxyServer({ xfwd: true });
  const server = http.createServer((req, res) => {
    const target = next();
    if (!target) return void res.writeHead(503, { 'Retry-After': '2' }).end('no instance is ready\n');
    proxy.web(req, res, { target }, () => {
      ready.delete(target); // until the next look says otherwise
      if (!res.headersSent) res.writeHead(502).end();
    });
  });
  server.on('upgrade', (req, socket, head) => {
    const target = next();
    socket.on('error', () => socket.destroy());
    if (!target) return void socket.destroy();
    proxy.ws(req, socket, head, { target }, () => socket.destroy());
  });
  return {
    look,
    listen: () => new Promise((resolve, reject) => server.once('error', reject).listen(port, '0.0.0.0', resolve)),
    close: () => {
      clearInterval(timer);
      server.closeAllConnections();
      server.close();
      proxy.close();
    },
  };
}

async function main() {
  fs.mkdirSync(state, { recursive: true });
  await buildParts(['web', 'server'], { ifStale: true });
  try {
    await ensureDatabase(databaseUrl);
  } catch (error) {
    throw new Error(`PostgreSQL at ${databaseUrl} does not answer (${error.message}); set DATABASE_URL`);
  }
  const s3 = new S3rver({ address: '127.0.0.1', port: 0, silent: true, directory: path.join(state, 's3'), configureBuckets: [{ name: 'barwright-photos' }] });
  const { port: s3Port } = await s3.run();
  const env = {
    NODE_ENV: 'development',
    DATABASE_URL: databaseUrl,
    REDIS_URL: redisUrl,
    SESSION_SECRET: sessionSecret(),
    PUBLIC_URL: publicUrl,
    TRUST_PROXY: 'loopback',
    S3_URL: `http://127.0.0.1:${s3Port}`,
    S3_BUCKET: 'barwright-photos',
    S3_ACCESS_KEY_ID: 'S3RVER', // s3rver's fixed credentials
    S3_SECRET_ACCESS_KEY: 'S3RVER',
  };
  const proxy = startProxy([`http://127.0.0.1:${port + 1}`, `http://127.0.0.1:${port + 2}`]);
  await proxy.listen();
  // One after the other: the first migrates and seeds the demo into an empty database.
  children.push(await startInstance('a', port + 1, env));
  children.push(await startInstance('b', port + 2, env));
  await proxy.look();
  say(`two instances (127.0.0.1:${port + 1}, :${port + 2}) on ${new URL(databaseUrl).host}${new URL(databaseUrl).pathname} and Redis ${new URL(redisUrl).host}; photos in s3rver (.tmp/cluster/s3)`);
  say(`each instance keeps its own fake mail server: the Mailbox page shows the mail of whichever instance answers`);
  say(`open ${publicUrl}`);

  let stopping = false;
  const stop = async () => {
    if (stopping) return;
    stopping = true;
    say('stopping');
    await Promise.all(children.map((c) => new Promise((r) => (c.exitCode !== null ? r() : (c.once('exit', r), c.kill('SIGTERM'))))));
    proxy.close();
    await s3.close();
    process.exit(0);
  };
  process.on('SIGINT', stop);
  process.on('SIGTERM', stop);
}

main().catch((error) => {
  console.error(`[cluster] ${error.message}`);
  for (const c of children) c.kill('SIGTERM');
  process.exitCode = 1;
  setTimeout(() => process.exit(1), 5000).unref();
});
