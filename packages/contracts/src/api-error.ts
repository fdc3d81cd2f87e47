/** The one error shape every API route answers with: `{ "error": { code, message, fields? } }`. */
export interface ApiErrorBody {
  error: {
    code: string;
    message: string;
    /** Field path (dotted, e.g. `rosette.layers[0].lobes`) → message naming the limit. */
    fields?: Record<string, string>;
  };
}

/** Close codes of the realtime sockets (4000–4999 are free for applications, RFC 6455 §7.4.2). */
export const CLOSE_CODES = {
  /** The server is shutting down (RFC 6455 §7.4.1, "going away"): the client reconnects, to another instance. */
  goingAway: 1001,
  unauthorized: 4401,
  forbidden: 4403,
  /** Your role on the board changed: the client reconnects and reads its new role. */
  roleChanged: 4409,
  /** An update that does not decode or apply, or that leaves the design unreadable: refused, nothing stored; final. */
  invalidUpdate: 4400,
  /** This session already has the most sockets allowed (realtime-limits.ts); final for this tab. */
  tooManySockets: 4429,
  /** More updates than the rate allows: the client may reconnect (outside 4400–4499, which y-websocket treats as final). */
  rateLimited: 4290,
  /** Set by the ws library itself: a frame larger than the server's maxPayload (RFC 6455 §7.4.1). */
  messageTooBig: 1009,
} as const;
