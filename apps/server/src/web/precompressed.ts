import fs from 'node:fs';
import path from 'node:path';

/** The encodings scripts/precompress.mjs writes beside a built file, in the server's order of preference. */
export const PRECOMPRESSED = { br: '.br', gzip: '.gz' } as const;
export type Encoding = keyof typeof PRECOMPRESSED;
const PREFERENCE = Object.keys(PRECOMPRESSED) as Encoding[];

/** Every file under `dir` (relative, `/`-separated) that has encoded siblings, with the encodings it has. */
export function listPrecompressed(dir: string): Map<string, Encoding[]> {
  const found = new Map<string, Encoding[]>();
  const visit = (folder: string) => {
    let names: fs.Dirent[];
    try {
      names = fs.readdirSync(folder, { withFileTypes: true });
    } catch {
      return; // not built yet
    }
    const here = new Set(names.map((n) => n.name));
    for (const entry of names) {
      const full = path.join(folder, entry.name);
      if (entry.isDirectory()) visit(full);
      else {
        const encodings = PREFERENCE.filter((e) => here.has(entry.name + PRECOMPRESSED[e]));
        if (encodings.length) found.set(path.relative(dir, full).split(path.sep).join('/'), encodings);
      }
    }
  };
  visit(dir);
  return found;
}

/**
 * The encoding to send, from an Accept-Encoding header (RFC 9110 §12.5.3: q-values, `*`, `q=0`
 * refusing one) and the encodings a file has: the highest q, ties going to brotli (smaller). No header,
 * or nothing acceptable: undefined (the file as it is).
 */
export function pickEncoding(header: string | undefined, offered: readonly Encoding[]): Encoding | undefined {
  if (!header) return undefined;
  const q = new Map<string, number>();
  for (const part of header.toLowerCase().split(',')) {
    const [name, ...params] = part.trim().split(';');
    if (!name) continue;
    const weight = params.map((p) => p.trim()).find((p) => p.startsWith('q='));
    const value = weight ? Number(weight.slice(2)) : 1;
    q.set(name.trim(), Number.isFinite(value) ? value : 0);
  }
  let best: Encoding | undefined;
  let bestQ = 0;
  for (const encoding of PREFERENCE) {
    if (!offered.includes(encoding)) continue;
    const weight = q.get(encoding) ?? (encoding === 'gzip' ? q.get('x-gzip') : undefined) ?? q.get('*') ?? 0;
    if (weight > bestQ) [best, bestQ] = [encoding, weight];
  }
  return best;
}
