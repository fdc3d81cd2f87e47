import { Router, type RequestHandler } from 'express';
import { asc } from 'drizzle-orm';
import { adminUpdateUserBody, type Role } from '@barwright/contracts';
import { users } from '../../../../db/schema';
import { forbidden, unauthenticated } from '../http/http-error';
import { parseBody } from '../http/validate';
import { toAdminUser } from '../auth/users';
// Role changes and suspensions go through one code path, which also writes the audit log.
import { changeAccount, type AccountChangeDeps } from './account-changes';

/** Lets the request through only for the given roles: 401 when signed out, 403 otherwise. */
export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    if (!req.user) throw unauthenticated();
    if (!roles.includes(req.user.role)) throw forbidden();
    next();
  };
}

export function adminRouter(deps: AccountChangeDeps): Router {
  const router = Router();
  router.use(requireRole('admin'));
  router.get('/users', async (_req, res) => {
    const rows = await deps.db.select().from(users).orderBy(asc(users.displayName));
    res.json(rows.map(toAdminUser));
  });
  router.patch('/users/:id', async (req, res) => {
    const { reason, undo, ...change } = parseBody(adminUpdateUserBody, req.body);
    res.json(toAdminUser(await changeAccount(deps, req.user!, req.params.id as string, change, { reason, undo })));
  });
  return router;
}
