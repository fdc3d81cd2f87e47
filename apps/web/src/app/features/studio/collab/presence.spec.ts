import { CLOSE_CODES } from '@barwright/contracts';
import { describe, expect, it } from 'vitest';
import { connectionStatus } from './connection-status';
import { colourAvoiding, colourFor, coloursTaken, initials, peersFrom, peoplePresent, PRESENCE_COLOURS } from './presence';

const state = (id: string, name: string, field: string | null = null) => ({ user: { id, name, colour: colourFor(id) }, field, pointer: null });

describe('presence', () => {
  it('gives each account a stable colour from the palette', () => {
    expect(colourFor('a-user')).toBe(colourFor('a-user'));
    expect(PRESENCE_COLOURS).toContain(colourFor('someone-else'));
  });

  it('moves off a colour someone here first is already wearing', () => {
    const own = colourFor('late-comer');
    expect(colourAvoiding('late-comer', new Set())).toBe(own);
    const moved = colourAvoiding('late-comer', new Set([own]));
    expect(moved).not.toBe(own);
    expect(colourAvoiding('late-comer', new Set(PRESENCE_COLOURS))).toBe(own);
    const peers = peersFrom(new Map<number, unknown>([[1, state('a', 'A')], [5, state('b', 'B')], [2, state('me', 'Me')]]), 3);
    expect(coloursTaken(peers, { clientId: 3, userId: 'me' })).toEqual(new Set([colourFor('a')]));
  });

  it('makes initials for avatars', () => {
    expect(initials('Maren Ashdown')).toBe('MA');
    expect(initials('  ibrahim ')).toBe('I');
    expect(initials('Anna de la Cruz')).toBe('AC');
    expect(initials('')).toBe('?');
  });

  it('lists the others, skips malformed states, and counts a person in two tabs once', () => {
    const states = new Map<number, unknown>([
      [1, state('me', 'Me')],
      [2, state('u2', 'Saskia Penrose', 'study.lines')],
      [3, state('u3', 'Ibrahim Coldwell')],
      [4, state('u3', 'Ibrahim Coldwell')],
      [5, {}],
    ]);
    const peers = peersFrom(states, 1);
    expect(peers.map((p) => p.clientId)).toEqual([3, 4, 2]);
    expect(peers[2].field).toBe('study.lines');
    expect(peoplePresent(peers).map((p) => p.user.name)).toEqual(['Ibrahim Coldwell', 'Saskia Penrose']);
  });
});

describe('connectionStatus', () => {
  const facts = { socket: 'connected' as const, synced: true, closedWith: null, browserOffline: false };
  it('is live only when connected and in step', () => {
    expect(connectionStatus(facts, CLOSE_CODES)).toBe('live');
    expect(connectionStatus({ ...facts, synced: false }, CLOSE_CODES)).toBe('connecting');
    expect(connectionStatus({ ...facts, socket: 'disconnected' }, CLOSE_CODES)).toBe('offline');
    expect(connectionStatus({ ...facts, browserOffline: true }, CLOSE_CODES)).toBe('offline');
  });

  it('tells a refused sign-in from a refused membership', () => {
    expect(connectionStatus({ ...facts, closedWith: 4401 }, CLOSE_CODES)).toBe('signed-out');
    expect(connectionStatus({ ...facts, closedWith: 4403 }, CLOSE_CODES)).toBe('no-access');
  });

  it('says a tab was stopped when the server refused an edit or one socket too many', () => {
    expect(connectionStatus({ ...facts, closedWith: CLOSE_CODES.invalidUpdate }, CLOSE_CODES)).toBe('refused');
    expect(connectionStatus({ ...facts, closedWith: CLOSE_CODES.tooManySockets }, CLOSE_CODES)).toBe('refused');
  });
});
