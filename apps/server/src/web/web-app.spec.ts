import fs from 'node:fs';
import http from 'node:http';
import os from 'node:os';
import path from 'node:path';
import zlib from 'node:zlib';
import express from 'express';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { webAppRouter } from './web-app';
import { pickEncoding } from './precompressed';
import { precompress } from '../../../../scripts/precompress.mjs';

/** One raw HTTP GET (no client-side decoding), so the bytes on the wire are what is checked. */
function get(port: number, pathname: string, headers: Record<string, string> = {}): Promise<{ status: number; headers: http.IncomingHttpHeaders; body: Buffer }> {
  return new Promise((resolve, reject) => {
    http.get({ host: '127.0.0.1', port, path: pathname, headers }, (res) => {
      const chunks: Buffer[] = [];
      res.on('data', (c: Buffer) => chunks.push(c));
      res.on('end', () => resolve({ status: res.statusCode!, headers: res.headers, body: Buffer.concat(chunks) }));
    }).on('error', reject);
  });
}

describe('the built web app on the wire', () => {
  let dist: string;
  let server: http.Server;
  let port: number;
  const script = `export const rows = ${JSON.stringify(Array.from({ length: 400 }, (_, i) => ({ lobe: i, amplitude: i / 7 })))};\n`;
  const page = `<!doctype html><html><head><title>Barwright</title>${'<link rel="modulepreload" href="chunk-ABCDEFGH.js">'.repeat(40)}</head><body><app-root></app-root></body></html>`;

  beforeAll(async () => {
    dist = fs.mkdtempSync(path.join(os.tmpdir(), 'bw-web-'));
    fs.writeFileSync(path.join(dist, 'index.html'), page);
    fs.writeFileSync(path.join(dist, 'main-ABCDEFGH.js'), script);
    fs.mkdirSync(path.join(dist, 'media'));
    fs.writeFileSync(path.join(dist, 'media', 'roboto-latin-400-normal-LOX3CHMS.woff2'), Buffer.alloc(3000, 7));
    fs.writeFileSync(path.join(dist, 'favicon.ico'), Buffer.alloc(200, 1));
    await precompress(dist);
    const app = express();
    app.use(webAppRouter(dist));
    server = http.createServer(app);
    await new Promise<void>((r) => server.listen(0, '127.0.0.1', r));
    port = (server.address() as { port: number }).port;
  });
  afterAll(() => {
    server.close();
    fs.rmSync(dist, { recursive: true, force: true });
  });

  it('sends a hashed script as brotli, gzip or as built, by Accept-Encoding, cached for a year, varying by encoding', async () => {
    const br = await get(port, '/main-ABCDEFGH.js', { 'accept-encoding': 'gzip, deflate, br, zstd' });
    expect(br.headers['content-encoding']).toBe('br');
    expect(br.headers['content-type']).toMatch(/^(text|application)\/javascript/);
    expect(br.headers.vary).toMatch(/Accept-Encoding/i);
    expect(br.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(zlib.brotliDecompressSync(br.body).toString()).toBe(script);
    expect(br.body.length).toBeLessThan(script.length / 3);

    const gz = await get(port, '/main-ABCDEFGH.js', { 'accept-encoding': 'gzip' });
    expect(gz.headers['content-encoding']).toBe('gzip');
    expect(zlib.gunzipSync(gz.body).toString()).toBe(script);

    const plain = await get(port, '/main-ABCDEFGH.js');
    expect(plain.headers['content-encoding']).toBeUndefined();
    expect(plain.headers.vary).toMatch(/Accept-Encoding/i);
    expect(plain.body.toString()).toBe(script);
    expect(plain.headers['cache-control']).toBe('public, max-age=31536000, immutable');
  });

  it('answers a conditional GET of the encoded file with 304', async () => {
    const first = await get(port, '/main-ABCDEFGH.js', { 'accept-encoding': 'br' });
    const again = await get(port, '/main-ABCDEFGH.js', { 'accept-encoding': 'br', 'if-none-match': String(first.headers.etag) });
    expect(again.status).toBe(304);
  });

  it('sends index.html compressed but never cached, for the root and for client routes', async () => {
    for (const route of ['/', '/explore', '/studio/boards/1']) {
      const res = await get(port, route, { 'accept-encoding': 'br;q=1.0, gzip;q=0.8' });
      expect(res.status).toBe(200);
      expect(res.headers['content-encoding']).toBe('br');
      expect(res.headers['content-type']).toMatch(/^text\/html/);
      expect(res.headers['cache-control']).toBe('no-cache');
      expect(zlib.brotliDecompressSync(res.body).toString()).toBe(page);
    }
  });

  it('leaves fonts and small files as they are, hashed fonts cached for a year', async () => {
    const font = await get(port, '/media/roboto-latin-400-normal-LOX3CHMS.woff2', { 'accept-encoding': 'br, gzip' });
    expect(font.headers['content-encoding']).toBeUndefined();
    expect(font.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    const icon = await get(port, '/favicon.ico', { 'accept-encoding': 'br, gzip' });
    expect(icon.headers['content-encoding']).toBeUndefined();
    expect(icon.headers['cache-control']).not.toMatch(/immutable/);
  });

  it('serves nothing from outside the folder (an escaping path gets the app page at most)', async () => {
    const traversal = await get(port, '/..%2f..%2f..%2fetc%2fpasswd');
    expect(traversal.body.toString()).not.toMatch(/root:/);
  });
});

describe('choosing an encoding from Accept-Encoding (RFC 9110 §12.5.3)', () => {
  it('prefers brotli on a tie, follows q-values, honours q=0 and *', () => {
    expect(pickEncoding('gzip, deflate, br', ['br', 'gzip'])).toBe('br');
    expect(pickEncoding('br;q=0.5, gzip', ['br', 'gzip'])).toBe('gzip');
    expect(pickEncoding('br;q=0, *', ['br', 'gzip'])).toBe('gzip');
    expect(pickEncoding('*;q=0', ['br', 'gzip'])).toBeUndefined();
    expect(pickEncoding('identity', ['br', 'gzip'])).toBeUndefined();
    expect(pickEncoding(undefined, ['br', 'gzip'])).toBeUndefined();
    expect(pickEncoding('br', ['gzip'])).toBeUndefined();
    expect(pickEncoding('x-gzip', ['br', 'gzip'])).toBe('gzip');
  });
});
