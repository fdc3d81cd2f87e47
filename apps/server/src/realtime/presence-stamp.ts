import * as decoding from 'lib0/decoding';
import * as encoding from 'lib0/encoding';

/** The account a socket belongs to, as presence shows it. */
export interface PresenceOwner {
  userId: string;
  displayName: string;
}

/** Yjs client ids a socket may speak for: a tab has one document, so one id (a few for reconnects). */
export const CLIENT_IDS_PER_SOCKET = 4;

/**
 * Rewrites an awareness update (y-protocols/awareness: count, then per client its id, clock and
 * state as JSON, `null` when it leaves) before it is relayed: each state's `user.id` and
 * `user.name` are the socket's account, whatever the client wrote, and a client id that another
 * socket already speaks for is left out. `owns(clientId)` says whether this socket may speak for
 * the id (claiming it when free). Undefined when nothing is left or the update does not decode.
 */
export function stampPresence(update: Uint8Array, owner: PresenceOwner, owns: (clientId: number) => boolean): Uint8Array | undefined {
  const entries: { clientId: number; clock: number; state: string }[] = [];
  try {
    const decoder = decoding.createDecoder(update);
    const count = decoding.readVarUint(decoder);
    for (let i = 0; i < count; i++) {
      const clientId = decoding.readVarUint(decoder);
      const clock = decoding.readVarUint(decoder);
      const state = stamped(JSON.parse(decoding.readVarString(decoder)), owner);
      if (owns(clientId)) entries.push({ clientId, clock, state });
    }
  } catch {
    return undefined;
  }
  if (entries.length === 0) return undefined;
  const encoder = encoding.createEncoder();
  encoding.writeVarUint(encoder, entries.length);
  for (const e of entries) {
    encoding.writeVarUint(encoder, e.clientId);
    encoding.writeVarUint(encoder, e.clock);
    encoding.writeVarString(encoder, e.state);
  }
  return encoding.toUint8Array(encoder);
}

function stamped(state: unknown, owner: PresenceOwner): string {
  if (state === null || typeof state !== 'object' || Array.isArray(state)) return JSON.stringify(state ?? null);
  const user = (state as { user?: unknown }).user;
  const base = user !== null && typeof user === 'object' && !Array.isArray(user) ? user : {};
  return JSON.stringify({ ...state, user: { ...base, id: owner.userId, name: owner.displayName } });
}
