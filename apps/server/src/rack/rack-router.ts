import express, { Router, type Request } from 'express';
import * as z from 'zod';
import { RACK_FILE_MAX_BYTES, rackFileSchema, rackRosetteBody, rackRosettePatch, rackShopBody, type RackFile, type RackShop } from '@barwright/contracts';
import type { Db } from '../database/database';
import { requireUser } from '../auth/auth-router';
import { refuseHostileShapes } from '../http/request-shape';
import { parseBody } from '../http/validate';
import { HttpError } from '../http/http-error';
import * as rack from './rack-service';
import { sweepsRouter } from './sweeps-router';

/** POST /api/rack/import (seen from the API router): its body is read by its own route, with the larger limit. */
export const isRackImport = (req: Request) => req.method === 'POST' && req.path.replace(/\/+$/, '') === '/rack/import';
/**
 * Lists and objects a rack file may hold. The largest rack within RACK_LIMITS holds about 30 000 (20 000
 * readings, 200 rosettes of 8 layers, tags); 4 MB of JSON can hold half a million (`[0,0],` repeated), and
 * walking those for U+0000, depth and the schema held the event loop for seconds.
 */
export const RACK_FILE_MAX_CONTAINERS = 100_000;

/** 400 once the body holds more than RACK_FILE_MAX_CONTAINERS lists and objects, stopping the count there. */
function refuseCrowdedRackFile(req: Request, _res: unknown, next: (error?: unknown) => void) {
  const todo: unknown[] = [req.body];
  let containers = 0;
  while (todo.length) {
    const v = todo.pop();
    if (!v || typeof v !== 'object') continue;
    if (++containers > RACK_FILE_MAX_CONTAINERS) {
      const limit = `must hold at most ${RACK_FILE_MAX_CONTAINERS.toLocaleString('en-GB').replace(/,/g, ' ')} lists and objects (a full rack holds about 30 000)`;
      return next(new HttpError(400, 'invalid_input', `The rack file ${limit}.`, { body: limit }));
    }
    const children: unknown[] = Array.isArray(v) ? v : Object.values(v);
    for (let i = 0; i < children.length; i++) if (children[i] && typeof children[i] === 'object') todo.push(children[i]);
  }
  next();
}

/** The rack file's body, read only for a signed-in member (a visitor's megabytes are never parsed). */
const rackFileBody = [
  (req: Request, _res: unknown, next: () => void) => {
    requireUser(req);
    next();
  },
  express.json({ limit: RACK_FILE_MAX_BYTES }),
  refuseCrowdedRackFile,
  refuseHostileShapes,
];

const importQuery = z.strictObject({ mode: z.enum(['replace', 'add'], { error: 'must be "replace" or "add"' }).default('replace') });

/** The member's own rack at /api/rack: nobody reads or changes another's (their rosettes answer 404). */
export function rackRouter(deps: { db: Db }): Router {
  const { db } = deps;
  const router = Router();

  router.get('/', async (req, res) => {
    res.json(await rack.readRack(db, requireUser(req)));
  });
  router.post('/rosettes', async (req, res) => {
    const user = requireUser(req);
    const body = parseBody(rackRosetteBody(user.units), req.body);
    res.status(201).json(await rack.addRosette(db, user, body));
  });
  router.patch('/rosettes/:id', async (req, res) => {
    const user = requireUser(req);
    const row = await rack.ownRosette(db, user.id, req.params.id);
    const patch = parseBody(rackRosettePatch(row.units), req.body);
    res.json(await rack.changeRosette(db, user.id, row.id, patch as Parameters<typeof rack.changeRosette>[3]));
  });
  router.delete('/rosettes/:id', async (req, res) => {
    await rack.removeRosette(db, requireUser(req).id, req.params.id);
    res.status(204).end();
  });
  router.put('/shop', async (req, res) => {
    const user = requireUser(req);
    const body = parseBody(rackShopBody(user.units), req.body);
    res.json(await rack.saveShop(db, user.id, { ...body, units: body.units ?? user.units } as RackShop));
  });
  router.get('/export', async (req, res) => {
    const file = await rack.exportRack(db, requireUser(req));
    res.setHeader('Content-Disposition', 'attachment; filename="rack.barwright-rack.json"');
    res.json(file);
  });
  router.post('/import', ...rackFileBody, async (req, res) => {
    const user = requireUser(req);
    const { mode } = parseBody(importQuery, req.query);
    const file = parseBody(rackFileSchema, req.body) as RackFile;
    res.json(await rack.importRack(db, user, file, mode));
  });
  router.use('/sweeps', sweepsRouter(deps));
  return router;
}
