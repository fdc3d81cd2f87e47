import { Router } from 'express';
import { sql } from 'drizzle-orm';
import type { Health, Readiness } from '@barwright/contracts';
import type { Db } from '../database/database';
import { livenessAnswer } from './liveness';

/** One dependency's probe: resolves when it answers. */
export type ReadinessCheck = () => Promise<unknown>;

/** How long one probe may take before the instance is reported unavailable. */
export const READINESS_TIMEOUT_MS = 2_000;

export interface HealthDeps {
  db: Db;
  databaseKind: Health['database'];
  /** Probes besides the database's, by name (main.ts adds `redis` when REDIS_URL is set). */
  readinessChecks?: Record<string, ReadinessCheck>;
  /** True once shutdown has begun: readiness answers 503 so the balancer sends no new traffic. */
  isDraining?: () => boolean;
}

async function probe(check: ReadinessCheck): Promise<Readiness['checks'][string]> {
  const started = performance.now();
  let timer: NodeJS.Timeout | undefined;
  try {
    const timeout = new Promise((_, reject) => (timer = setTimeout(() => reject(new Error(`no answer in ${READINESS_TIMEOUT_MS} ms`)), READINESS_TIMEOUT_MS)));
    await Promise.race([check(), timeout]);
    return { ok: true, ms: Math.round(performance.now() - started) };
  } catch (error) {
    return { ok: false, ms: Math.round(performance.now() - started), error: (error as Error).message?.slice(0, 200) || 'failed' };
  } finally {
    clearTimeout(timer);
  }
}

/**
 * `GET /health`: liveness, the process answers (a balancer or supervisor restarts it when not).
 * `GET /health/ready`: readiness, every dependency answers within READINESS_TIMEOUT_MS; 503 otherwise
 * and while draining. Neither needs a session; both are mounted before the session parser.
 */
export function healthRouter(deps: HealthDeps): Router {
  const router = Router();
  const checks: Record<string, ReadinessCheck> = { database: () => deps.db.execute(sql`select 1`), ...deps.readinessChecks };
  // Liveness is probed often and its answer never changes: written once, sent as it is (no ETag to hash).
  // The server's listener answers it before Express (http/liveness.ts); this route serves an app mounted alone.
  const alive = livenessAnswer(deps.databaseKind);
  router.get('/health', (_req, res) => {
    res.writeHead(200, alive.headers).end(alive.body);
  });
  router.get('/health/ready', async (_req, res) => {
    const names = Object.keys(checks);
    const results = await Promise.all(names.map((name) => probe(checks[name])));
    const answer: Readiness = {
      status: deps.isDraining?.() ? 'draining' : results.every((r) => r.ok) ? 'ready' : 'unavailable',
      checks: Object.fromEntries(names.map((name, i) => [name, results[i]])),
    };
    res.status(answer.status === 'ready' ? 200 : 503).set('Cache-Control', 'no-store').json(answer);
  });
  return router;
}
