import { Injectable, signal } from '@angular/core';
import type { NotifyClientEvents, NotifyServerEvents } from '@barwright/contracts';
import type { Socket } from 'socket.io-client';

/** Where the notification socket stands: off (signed out), connecting, live, or refused by the server. */
export type NotifySocketState = 'off' | 'connecting' | 'live' | 'refused';

export type NotifyHandlers = { [E in keyof NotifyServerEvents]: NotifyServerEvents[E] };

/**
 * The socket.io connection at /socket.io on our own origin. The session cookie goes with the
 * handshake, and the server puts the socket in this user's room only; the client just listens.
 * The connection code is loaded on first use (see notify-socket.ts), so visitors never download it.
 */
@Injectable({ providedIn: 'root' })
export class NotifySocketClient {
  private socket: Socket<NotifyServerEvents, NotifyClientEvents> | null = null;
  private generation = 0;
  private readonly current = signal<NotifySocketState>('off');

  readonly state = this.current.asReadonly();

  /** Opens a new connection (closing any earlier one) and routes the server's events to `handlers`. */
  async connect(handlers: NotifyHandlers): Promise<void> {
    this.disconnect();
    const generation = ++this.generation;
    this.current.set('connecting');
    const { openNotifySocket, NOTIFY_REFUSALS } = await import('./notify-socket');
    if (generation !== this.generation) return; // signed out (or in as someone else) while loading
    const socket = openNotifySocket();
    socket.on('connect', () => this.current.set('live'));
    socket.on('disconnect', () => this.current.set(socket.active ? 'connecting' : 'off'));
    socket.on('connect_error', (error) => {
      // A refusal by the server's handshake check is final; socket.io retries network failures by itself.
      if (error.message === NOTIFY_REFUSALS.unauthorized || !socket.active) this.current.set('refused');
    });
    socket.on('notification:new', handlers['notification:new']);
    socket.on('notification:unread', handlers['notification:unread']);
    this.socket = socket;
  }

  disconnect(): void {
    this.generation++;
    this.socket?.removeAllListeners();
    this.socket?.disconnect();
    this.socket = null;
    this.current.set('off');
  }
}
