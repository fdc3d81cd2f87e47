import { and, asc, eq, inArray, sql } from 'drizzle-orm';
import { EMPTY_SHOP, RACK_FORMAT, RACK_LIMITS, rackReadingsProblem, rosetteReadings, type Rack, type RackFile, type RackRosette, type RackRosettePatch, type RackShop, type RosetteObject, type Units } from '@barwright/contracts';
import { rackRosettes, rackShops, type RackRosetteRow } from '../../../../db/schema';
import type { Db } from '../database/database';
import { ADVISORY_LOCKS, advisoryXactLock } from '../database/advisory-locks';
import { HttpError, notFound } from '../http/http-error';
import { isUuid } from '../http/uuid';

type Owner = { id: string; units: Units };
type Tx = Parameters<Parameters<Db['transaction']>[0]>[0];

export const toRackRosette = (row: RackRosetteRow): RackRosette => ({
  id: row.id,
  name: row.name,
  units: row.units,
  rosette: row.rosette,
  tags: row.tags,
  notes: row.notes,
  createdAt: row.createdAt.toISOString(),
  updatedAt: row.updatedAt.toISOString(),
});

const rackFull = (asked?: number) =>
  new HttpError(400, 'invalid_input', `A rack holds at most ${RACK_LIMITS.rosettes} rosettes; delete some first.`, { rosettes: `a rack holds at most ${RACK_LIMITS.rosettes} rosettes${asked === undefined ? '' : ` (${asked} more asked for)`}` });

export async function rackRosetteRows(db: Db | Tx, ownerId: string): Promise<RackRosetteRow[]> {
  return db.select().from(rackRosettes).where(eq(rackRosettes.ownerId, ownerId)).orderBy(asc(rackRosettes.createdAt), asc(rackRosettes.id));
}

export async function rackShop(db: Db | Tx, owner: Owner): Promise<RackShop> {
  const [row] = await db.select().from(rackShops).where(eq(rackShops.ownerId, owner.id));
  return row?.shop ?? EMPTY_SHOP(owner.units);
}

export async function readRack(db: Db, owner: Owner): Promise<Rack> {
  const [rows, shop] = await Promise.all([rackRosetteRows(db, owner.id), rackShop(db, owner)]);
  return { units: owner.units, rosettes: rows.map(toRackRosette), shop };
}

/** A rosette of this owner's rack; anyone else's answers 404, as if it did not exist. */
export async function ownRosette(db: Db | Tx, ownerId: string, id: string): Promise<RackRosetteRow> {
  const [row] = isUuid(id) ? await db.select().from(rackRosettes).where(and(eq(rackRosettes.id, id), eq(rackRosettes.ownerId, ownerId))) : [];
  if (!row) throw notFound('rack rosette');
  return row;
}

/** The measured readings held by the owner's rosettes, leaving out `except` (the one being replaced). */
async function readingsHeld(db: Db | Tx, ownerId: string, except?: string): Promise<number> {
  const rows = await db.select({ id: rackRosettes.id, rosette: rackRosettes.rosette }).from(rackRosettes).where(eq(rackRosettes.ownerId, ownerId));
  return rows.reduce((n, row) => (row.id === except ? n : n + rosetteReadings(row.rosette)), 0);
}

/** Refuses a change that would take the rack past RACK_LIMITS.readings, naming `field`. */
function checkReadings(total: number, field: string): void {
  const problem = rackReadingsProblem(total);
  if (problem) throw new HttpError(400, 'invalid_input', `${problem[0].toUpperCase()}${problem.slice(1)}.`, { [field]: problem });
}

async function rosetteCount(db: Db | Tx, ownerId: string): Promise<number> {
  const [{ n }] = await db.select({ n: sql<number>`count(*)::int` }).from(rackRosettes).where(eq(rackRosettes.ownerId, ownerId));
  return n;
}

export async function addRosette(db: Db, owner: Owner, body: { name: string; units?: Units; rosette: unknown; tags?: string[]; notes?: string }): Promise<RackRosette> {
  return db.transaction(async (tx) => {
    // One change of a member's rack at a time, so two quick adds cannot both pass the count.
    await advisoryXactLock(tx, ADVISORY_LOCKS.rack, owner.id);
    if ((await rosetteCount(tx, owner.id)) >= RACK_LIMITS.rosettes) throw rackFull();
    const adds = rosetteReadings(body.rosette);
    if (adds) checkReadings((await readingsHeld(tx, owner.id)) + adds, 'rosette');
    const [row] = await tx
      .insert(rackRosettes)
      .values({ ownerId: owner.id, name: body.name, units: body.units ?? owner.units, rosette: body.rosette as RosetteObject, tags: body.tags ?? [], notes: body.notes ?? '' })
      .returning();
    return toRackRosette(row);
  });
}

export async function changeRosette(db: Db, ownerId: string, id: string, patch: RackRosettePatch): Promise<RackRosette> {
  return db.transaction(async (tx) => {
    await advisoryXactLock(tx, ADVISORY_LOCKS.rack, ownerId);
    const row = await ownRosette(tx, ownerId, id);
    const adds = patch.rosette === undefined ? 0 : rosetteReadings(patch.rosette);
    if (adds > rosetteReadings(row.rosette)) checkReadings((await readingsHeld(tx, ownerId, row.id)) + adds, 'rosette');
    const [updated] = await tx
      .update(rackRosettes)
      .set({
        ...(patch.name !== undefined ? { name: patch.name } : {}),
        ...(patch.units !== undefined ? { units: patch.units } : {}),
        ...(patch.rosette !== undefined ? { rosette: patch.rosette } : {}),
        ...(patch.tags !== undefined ? { tags: patch.tags } : {}),
        ...(patch.notes !== undefined ? { notes: patch.notes } : {}),
        updatedAt: new Date(),
      })
      .where(eq(rackRosettes.id, row.id))
      .returning();
    if (!updated) throw notFound('rack rosette'); // deleted (removeRosette takes no lock) while this change was checked
    return toRackRosette(updated);
  });
}

export async function removeRosette(db: Db, ownerId: string, id: string): Promise<void> {
  const row = await ownRosette(db, ownerId, id);
  await db.delete(rackRosettes).where(eq(rackRosettes.id, row.id));
}

export async function saveShop(db: Db | Tx, ownerId: string, shop: RackShop): Promise<RackShop> {
  await db
    .insert(rackShops)
    .values({ ownerId, shop })
    .onConflictDoUpdate({ target: rackShops.ownerId, set: { shop, updatedAt: new Date() } });
  return shop;
}

export async function exportRack(db: Db, owner: Owner): Promise<RackFile> {
  const rack = await readRack(db, owner);
  return {
    format: RACK_FORMAT,
    rosettes: rack.rosettes.map(({ name, units, rosette, tags, notes }) => ({ name, units, rosette, tags, notes })),
    shop: rack.shop,
  };
}

/**
 * Imports a checked rack file in one transaction: `replace` (the default) makes the rack the file's,
 * `add` adds its rosettes and keeps the member's shop. Either all of it is stored or nothing.
 */
export async function importRack(db: Db, owner: Owner, file: RackFile, mode: 'replace' | 'add'): Promise<Rack> {
  await db.transaction(async (tx) => {
    await advisoryXactLock(tx, ADVISORY_LOCKS.rack, owner.id);
    if (mode === 'replace') {
      await tx.delete(rackRosettes).where(eq(rackRosettes.ownerId, owner.id));
      await saveShop(tx, owner.id, file.shop);
    } else if ((await rosetteCount(tx, owner.id)) + file.rosettes.length > RACK_LIMITS.rosettes) {
      throw rackFull(file.rosettes.length);
    } else {
      const adds = file.rosettes.reduce((n, r) => n + rosetteReadings(r.rosette), 0);
      if (adds) checkReadings((await readingsHeld(tx, owner.id)) + adds, 'rosettes');
    }
    // The file's order is kept: each row a millisecond after the one before (the rack lists by creation time).
    const start = Date.now();
    const rows = file.rosettes.map((r, i) => ({ ownerId: owner.id, ...r, createdAt: new Date(start + i), updatedAt: new Date(start + i) }));
    if (rows.length) await tx.insert(rackRosettes).values(rows);
  });
  return readRack(db, owner);
}

/** The rows of these ids that are the owner's, in no particular order. */
export async function ownRosettesAmong(db: Db, ownerId: string, ids: string[]): Promise<RackRosetteRow[]> {
  return ids.length ? db.select().from(rackRosettes).where(and(eq(rackRosettes.ownerId, ownerId), inArray(rackRosettes.id, ids))) : [];
}
