// Writes brotli (`.br`, quality 11) and gzip (`.gz`, level 9) siblings of the built web app's text
// files, once at build time, so the server sends them compressed at no cost per request
// (apps/server/src/web/web-app.ts picks one by Accept-Encoding). Fonts (woff, woff2) and images are
// compressed already; files under 1 KiB gain nothing worth a second file.
import fs from 'node:fs';
import path from 'node:path';
import zlib from 'node:zlib';
import { promisify } from 'node:util';

const COMPRESSIBLE = /\.(js|mjs|css|html|svg|json|txt|webmanifest|xml|ico)$/i;
const MIN_BYTES = 1024;
const brotli = promisify(zlib.brotliCompress);
const gzip = promisify(zlib.gzip);

function textFiles(dir) {
  const out = [];
  for (const entry of fs.readdirSync(dir, { withFileTypes: true })) {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) out.push(...textFiles(full));
    else if (COMPRESSIBLE.test(entry.name)) out.push(full);
  }
  return out;
}

/** Compresses every text file under `dir`; returns the bytes before and after (brotli). */
export async function precompress(dir) {
  let raw = 0;
  let br = 0;
  for (const file of textFiles(dir)) {
    const data = fs.readFileSync(file);
    for (const stale of ['.br', '.gz']) fs.rmSync(file + stale, { force: true });
    if (data.length < MIN_BYTES) continue;
    const [b, g] = await Promise.all([
      brotli(data, { params: { [zlib.constants.BROTLI_PARAM_QUALITY]: 11, [zlib.constants.BROTLI_PARAM_SIZE_HINT]: data.length } }),
      gzip(data, { level: 9 }),
    ]);
    // Keep an encoding only when it saves something (a woff's own compression leaves little).
    if (b.length < data.length * 0.95) fs.writeFileSync(file + '.br', b);
    if (g.length < data.length * 0.95) fs.writeFileSync(file + '.gz', g);
    raw += data.length;
    br += Math.min(b.length, data.length);
  }
  return { raw, br };
}

if (process.argv[1] && path.resolve(process.argv[1]) === new URL(import.meta.url).pathname) {
  const dir = process.argv[2] ?? 'dist/web/browser';
  const { raw, br } = await precompress(dir);
  console.log(`precompressed ${dir}: ${(raw / 1024).toFixed(0)} kB of text to ${(br / 1024).toFixed(0)} kB (brotli)`);
}
