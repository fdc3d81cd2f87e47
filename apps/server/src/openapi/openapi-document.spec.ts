import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { openApiDocument, ROUTES } from './openapi-document';
import { COMMUNITY_ROUTES } from './community-routes';
import { MODERATION_ROUTES } from './moderation-routes';
import { RACK_ROUTES } from './rack-routes';

/** Every `router.<method>('…')` in the server's routers, with the mount point each router has in app.ts. */
function routesInCode(): string[] {
  const mounts: Record<string, string> = {
    'auth/auth-router.ts': '/api/auth',
    'admin/admin-router.ts': '/api/admin',
    'dev/mailbox-router.ts': '/api/dev',
    'designs/designs-router.ts': '/api/designs',
    'boards/boards-router.ts': '/api/boards',
    'rack/rack-router.ts': '/api/rack',
    'rack/sweeps-router.ts': '/api/rack/sweeps',
  };
  const found: string[] = [];
  const src = path.join(import.meta.dirname, '..');
  // Every other router file is mounted on /api itself and names its full paths.
  const all = fs.readdirSync(src, { recursive: true, encoding: 'utf8' }).filter((f) => f.endsWith('-router.ts'));
  for (const file of all) mounts[file] ??= '/api';
  for (const [file, base] of Object.entries(mounts)) {
    for (const m of fs.readFileSync(path.join(src, file), 'utf8').matchAll(/router\.(get|post|patch|put|delete)\(\s*'([^']*)'/g)) {
      // boards-router.ts also holds the invitations router, mounted at /api/invitations.
      const full = m[2] === '/accept' ? '/api/invitations/accept' : base + (m[2] === '/' ? '' : m[2]);
      found.push(`${m[1]} ${full.replace(/:(\w+)/g, '{$1}')}`);
    }
  }
  return found;
}

describe('the OpenAPI document', () => {
  it('is OpenAPI 3.1 with request bodies from the contracts schemas', () => {
    const doc = openApiDocument() as any;
    expect(doc.openapi).toBe('3.1.0');
    const signUp = doc.paths['/api/auth/sign-up'].post.requestBody.content['application/json'].schema;
    expect(signUp.properties.password.minLength).toBe(12);
    expect(doc.paths['/api/boards/{id}/designs'].post.parameters[0]).toMatchObject({ name: 'id', in: 'path' });
  });

  it('documents every route the routers declare', () => {
    const documented = new Set([...ROUTES, ...COMMUNITY_ROUTES, ...MODERATION_ROUTES, ...RACK_ROUTES].map((r) => `${r.method} ${r.path}`));
    for (const route of routesInCode()) expect(documented, route).toContain(route);
  });
});
