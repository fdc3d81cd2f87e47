import { MODERATION_NAMESPACE, NOTIFY_SOCKET_PATH, type ModerationClientEvents, type ModerationServerEvents } from '@barwright/contracts';
import { io, type Socket } from 'socket.io-client';

/**
 * Opens the desk's socket: the moderation namespace on the notification socket's path (one
 * connection carries both). Loaded only once a moderator or admin is signed in.
 */
export function openDeskSocket(): Socket<ModerationServerEvents, ModerationClientEvents> {
  return io(MODERATION_NAMESPACE, { path: NOTIFY_SOCKET_PATH, withCredentials: true, transports: ['websocket', 'polling'] });
}
