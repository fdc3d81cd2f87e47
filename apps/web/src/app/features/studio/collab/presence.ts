/** What each client puts in its awareness state (the presence contract between browsers). */
export interface PresenceState {
  user: { id: string; name: string; colour: string };
  /** Dotted path of the field being edited (`rosette.layers[0].lobes`), or null. */
  field: string | null;
  /** Pointer over one of the views, as fractions of that view's width and height, or null. */
  pointer: { view: string; x: number; y: number } | null;
}

/** Someone else in the design (one browser tab: the same person may be here twice). */
export interface Peer extends PresenceState {
  clientId: number;
}

/**
 * Colours for people, distinct from each other on paper and on the dark ground, and none of them
 * the brass kept for the one action on a page. White initials sit on them: each gives white at
 * least 4.5:1 (WCAG 2.2 AA for small text; an orange of 4.44:1 failed the accessibility check).
 */
export const PRESENCE_COLOURS = ['#1f78b4', '#c2185b', '#2e7d32', '#6a3d9a', '#bf360c', '#00767f', '#795548', '#5c6bc0'] as const;

/** A stable colour for an account, so a person keeps theirs from visit to visit. */
export function colourFor(userId: string): string {
  return PRESENCE_COLOURS[hashOf(userId) % PRESENCE_COLOURS.length];
}

/**
 * The account's own colour unless someone else here already wears it; then the next free one of
 * the palette (the account's own again if every colour is taken). `taken` holds the colours of the
 * people who keep theirs (those who were here first: a lower Yjs client id).
 */
export function colourAvoiding(userId: string, taken: ReadonlySet<string>): string {
  const start = hashOf(userId) % PRESENCE_COLOURS.length;
  for (let i = 0; i < PRESENCE_COLOURS.length; i++) {
    const colour = PRESENCE_COLOURS[(start + i) % PRESENCE_COLOURS.length];
    if (!taken.has(colour)) return colour;
  }
  return PRESENCE_COLOURS[start];
}

function hashOf(text: string): number {
  let hash = 2166136261; // FNV-1a, 32 bit
  for (let i = 0; i < text.length; i++) {
    hash ^= text.charCodeAt(i);
    hash = Math.imul(hash, 16777619);
  }
  return hash >>> 0;
}

/** Colours the people who keep theirs are wearing: other accounts with a lower client id than ours. */
export function coloursTaken(peers: readonly Peer[], self: { clientId: number; userId: string }): Set<string> {
  return new Set(peers.filter((p) => p.user.id !== self.userId && p.clientId < self.clientId).map((p) => p.user.colour));
}

/** Up to two initials for an avatar: "Maren Ashdown" → "MA", "ibrahim" → "I". */
export function initials(name: string): string {
  const words = name.trim().split(/\s+/).filter(Boolean);
  const letters = words.length > 1 ? [words[0], words[words.length - 1]] : words;
  return letters.map((w) => w[0].toLocaleUpperCase()).join('') || '?';
}

/** The other clients with a well-formed presence state, ordered by name. */
export function peersFrom(states: ReadonlyMap<number, unknown>, selfClientId: number): Peer[] {
  const peers: Peer[] = [];
  for (const [clientId, state] of states) {
    if (clientId === selfClientId || !isPresence(state)) continue;
    peers.push({ clientId, user: state.user, field: state.field ?? null, pointer: state.pointer ?? null });
  }
  return peers.sort((a, b) => a.user.name.localeCompare(b.user.name) || a.clientId - b.clientId);
}

/** One entry per person (several tabs of one person count once), for the avatars. */
export function peoplePresent(peers: readonly Peer[]): Peer[] {
  const seen = new Set<string>();
  return peers.filter((p) => !seen.has(p.user.id) && seen.add(p.user.id));
}

function isPresence(state: unknown): state is PresenceState {
  const user = (state as { user?: Record<string, unknown> } | null)?.user;
  return !!user && typeof user['id'] === 'string' && typeof user['name'] === 'string' && typeof user['colour'] === 'string';
}
