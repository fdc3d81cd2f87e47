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
  unauthorized: 4401,
  forbidden: 4403,
  /** Your role on the board changed: the client reconnects and reads its new role. */
  roleChanged: 4409,
} as const;
