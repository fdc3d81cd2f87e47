import { computed, effect, inject, Injectable, signal, untracked } from '@angular/core';
import type { ModerationClientEvents, ModerationServerEvents } from '@barwright/contracts';
import type { Socket } from 'socket.io-client';
import { AuthStore } from '../../core/auth/auth-store';

/**
 * The number of open reports, live, for moderators and admins (the top bar's badge, the queue's
 * "new reports" note). The server ends the socket when the role is taken away; signing out closes it.
 */
@Injectable({ providedIn: 'root' })
export class DeskCount {
  private readonly auth = inject(AuthStore);
  private readonly count = signal<number | null>(null);
  private socket: Socket<ModerationServerEvents, ModerationClientEvents> | null = null;
  private generation = 0;
  private readonly staffId = computed(() => {
    const me = this.auth.me();
    return me && (me.role === 'moderator' || me.role === 'admin') ? me.id : null;
  });

  /** Null until the server has said (or for members). */
  readonly openReports = this.count.asReadonly();

  constructor() {
    effect(() => {
      const id = this.staffId();
      untracked(() => (id ? void this.start() : this.stop()));
    });
  }

  private async start(): Promise<void> {
    this.stop();
    const generation = ++this.generation;
    const { openDeskSocket } = await import('./desk-socket');
    if (generation !== this.generation) return; // signed out meanwhile
    const socket = openDeskSocket();
    socket.on('moderation:queue', (n) => this.count.set(n));
    // A refusal (the role was taken away) is final: no badge, no retries.
    socket.on('connect_error', () => {
      if (!socket.active) this.count.set(null);
    });
    socket.on('disconnect', (reason) => {
      if (reason === 'io server disconnect') this.count.set(null);
    });
    this.socket = socket;
  }

  private stop(): void {
    this.generation++;
    this.socket?.removeAllListeners();
    this.socket?.disconnect();
    this.socket = null;
    this.count.set(null);
  }
}
