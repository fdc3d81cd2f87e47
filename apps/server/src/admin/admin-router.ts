import { Router, type RequestHandler } from 'express';
import { asc, eq } from 'drizzle-orm';
import { adminUpdateUserBody, type Role } from '@barwright/contracts';
import { users } from '../../../../db/schema';
import type { Db } from '../database/database';
import type { DatabaseSessionStore } from '../auth/session-store';
import { HttpError, forbidden, notFound, unauthenticated } from '../http/http-error';
import { parseBody } from '../http/validate';
import { findUserById, toAdminUser } from '../auth/users';

/** Lets the request through only for the given roles: 401 when signed out, 403 otherwise. */
export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) throw unauthenticated();
    if (!roles.includes(req.user.role)) throw forbidden();
    next();
  };
}

export function adminRouter(deps: { db: Db; sessionStore: DatabaseSessionStore; closeUserSockets: (userId: string) => void }): Router {
  const router = Router();
  router.use(requireRole('admin'));
  router.get('/users', async (_req, res) => {
    const rows = await deps.db.select().from(users).orderBy(asc(users.displayName));
    res.json(rows.map(toAdminUser));
  });
  router.patch('/users/:id', async (req, res) => {
    const body = parseBody(adminUpdateUserBody, req.body);
    const target = await findUserById(deps.db, req.params.id as string);
    if (!target) throw notFound('user');
    // An admin cannot lock themselves out: another admin must do it.
    if (target.id === req.user!.id && ((body.role && body.role !== 'admin') || body.suspended)) {
      throw new HttpError(409, 'conflict', 'You cannot demote or suspend your own account; ask another admin.');
    }
    const changes: Partial<typeof users.$inferInsert> = {};
    if (body.role) changes.role = body.role;
    if (body.suspended !== undefined) changes.suspendedAt = body.suspended ? (target.suspendedAt ?? new Date()) : null;
    const [row] = await deps.db.update(users).set(changes).where(eq(users.id, target.id)).returning();
    if (body.suspended) {
      await deps.sessionStore.destroyUserSessions(target.id);
      deps.closeUserSockets(target.id);
    }
    res.json(toAdminUser(row));
  });
  return router;
}
