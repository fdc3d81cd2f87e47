import { NOTIFY_SOCKET_PATH, type NotifyClientEvents, type NotifyServerEvents } from '@barwright/contracts';
import { io, type Socket } from 'socket.io-client';

export { NOTIFY_REFUSALS } from '@barwright/contracts';

/**
 * Opens the notification socket on our own origin, the session cookie going with the handshake.
 * Loaded on first sign-in only (with socket.io-client and the contracts), so visitors never download it.
 */
export function openNotifySocket(): Socket<NotifyServerEvents, NotifyClientEvents> {
  return io({ path: NOTIFY_SOCKET_PATH, withCredentials: true, transports: ['websocket', 'polling'] });
}
