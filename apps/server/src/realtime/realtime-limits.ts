/**
 * The limits of the realtime sockets (the collab WebSocket at /collab/<designId> and socket.io at
 * /socket.io), in one place. Tests may lower or raise them through the gateways' `limits` option.
 */
export interface RealtimeLimits {
  /**
   * Largest WebSocket frame accepted on /collab (bytes; ws closes the socket with 1009 above it).
   * The largest valid design (8 layers × 3600 measured readings) encodes to about 565 KiB as a full
   * Yjs state, which a client sends whole in its first sync; the example design is 767 bytes.
   * 1 MiB fits that state and its notes; ws's default (100 MiB) let one message hold 8 GB.
   */
  maxFrameBytes: number;
  /**
   * Document updates per account, over all its sockets and sessions (a bucket per socket would grow
   * with every socket opened): a token bucket of `burst` tokens refilled at `perSecond`; past it the
   * socket that sent the update is closed (rateLimited). The bucket outlives a reconnect.
   */
  updates: { burst: number; perSecond: number };
  /** Presence (awareness) messages per account: past the bucket they are dropped (presence is superseded by the next one anyway). */
  awareness: { burst: number; perSecond: number };
  /** Largest awareness message relayed (bytes); a presence state is about 150 bytes. Larger ones are dropped. */
  maxAwarenessBytes: number;
  /** Open collab sockets per session, and per user over all their sessions; one more is refused (tooManySockets). */
  socketsPerSession: number;
  socketsPerUser: number;
  /**
   * Largest design a document may hold, as the JSON of its design map (bytes), and the longest notes
   * (characters). The largest valid design (8 layers × 3600 measured readings) is about 400 KiB of
   * JSON; without a bound, updates each under the frame size add up to a document too big to open.
   */
  maxDesignJsonBytes: number;
  maxNotesChars: number;
  /** Bytes queued for one socket above which it is dropped as a slow consumer (it reconnects and syncs afresh). */
  slowConsumerBytes: number;
  /** socket.io: largest message a client may send (bytes; clients only send the handshake and pings). */
  notifyMaxMessageBytes: number;
  /** socket.io: connections per session and per user, over the notification and moderation namespaces each. */
  notifySocketsPerSession: number;
  notifySocketsPerUser: number;
}

export const DEFAULT_REALTIME_LIMITS: RealtimeLimits = {
  maxFrameBytes: 1024 * 1024,
  // Typing sends one update per keystroke; 300 in a burst covers a paste of many edits and a reconnect's catch-up.
  updates: { burst: 300, perSecond: 50 },
  // The studio sends the pointer at most every 40 ms (25/s).
  awareness: { burst: 60, perSecond: 30 },
  maxAwarenessBytes: 4 * 1024,
  socketsPerSession: 16,
  socketsPerUser: 48,
  // Four full states of the largest design.
  slowConsumerBytes: 4 * 1024 * 1024,
  maxDesignJsonBytes: 768 * 1024,
  maxNotesChars: 50_000,
  notifyMaxMessageBytes: 16 * 1024,
  notifySocketsPerSession: 16,
  notifySocketsPerUser: 48,
};

/** A token bucket: `take()` is true while tokens last; they come back at `perSecond`, up to `burst`. */
export class TokenBucket {
  private tokens: number;
  private last = performance.now();

  constructor(private readonly rate: { burst: number; perSecond: number }) {
    this.tokens = rate.burst;
  }

  take(): boolean {
    const now = performance.now();
    this.tokens = Math.min(this.rate.burst, this.tokens + ((now - this.last) / 1000) * this.rate.perSecond);
    this.last = now;
    if (this.tokens < 1) return false;
    this.tokens -= 1;
    return true;
  }

  /** True once the bucket has refilled completely: forgetting it then gives nobody a larger allowance. */
  full(): boolean {
    return this.tokens + ((performance.now() - this.last) / 1000) * this.rate.perSecond >= this.rate.burst;
  }
}

/** The update and presence buckets of each account, shared by all its sockets and kept until they refill. */
export class AccountBuckets {
  private readonly buckets = new Map<string, { updates: TokenBucket; awareness: TokenBucket }>();

  constructor(private readonly limits: Pick<RealtimeLimits, 'updates' | 'awareness'>) {}

  of(userId: string): { updates: TokenBucket; awareness: TokenBucket } {
    let found = this.buckets.get(userId);
    if (!found) {
      this.sweep();
      found = { updates: new TokenBucket(this.limits.updates), awareness: new TokenBucket(this.limits.awareness) };
      this.buckets.set(userId, found);
    }
    return found;
  }

  /** Drops the buckets that have refilled (their accounts went quiet), so the map stays as small as the active accounts. */
  sweep(): void {
    for (const [userId, b] of this.buckets) if (b.updates.full() && b.awareness.full()) this.buckets.delete(userId);
  }
}
