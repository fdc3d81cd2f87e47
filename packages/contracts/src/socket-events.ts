import type { Notification } from './notifications';

/**
 * The notification socket (socket.io at NOTIFY_SOCKET_PATH on the app's own origin). The session
 * cookie is checked at the handshake: without a signed-in session the connection is refused
 * with a `connect_error` whose message is NOTIFY_REFUSALS.unauthorized. Each connection joins
 * its user's room only, so a client hears nothing but its own notifications. The server speaks;
 * clients send nothing (reading is done through REST).
 */
export const NOTIFY_SOCKET_PATH = '/socket.io';

export const NOTIFY_REFUSALS = { unauthorized: 'unauthorized' } as const;

/** The room of one user's sockets. */
export const userRoom = (userId: string) => `user:${userId}`;

export interface NotifyServerEvents {
  /** A new notification, with the unread count after it. */
  'notification:new': (notification: Notification, unread: number) => void;
  /** The unread count changed (read elsewhere), and once right after connecting. */
  'notification:unread': (unread: number) => void;
}

export interface NotifyClientEvents {}
