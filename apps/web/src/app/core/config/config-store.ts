import { HttpClient } from '@angular/common/http';
import { inject, Injectable, signal } from '@angular/core';
import type { ClientConfig } from '@barwright/contracts';
import { firstValueFrom } from 'rxjs';

const OFFLINE: ClientConfig = { localMail: false, demo: false };

/** What the server says about itself (`GET /api/config`), read once at start-up. */
@Injectable({ providedIn: 'root' })
export class ConfigStore {
  private readonly http = inject(HttpClient);
  private readonly current = signal<ClientConfig>(OFFLINE);
  private readonly answered = signal(true);

  readonly config = this.current.asReadonly();
  /** False when the server did not answer at start-up; the shell says so. */
  readonly reachable = this.answered.asReadonly();

  /** Never throws: without an answer the app runs with every optional feature off. */
  async load(): Promise<void> {
    try {
      this.current.set(await firstValueFrom(this.http.get<ClientConfig>('/api/config')));
      this.answered.set(true);
    } catch (error) {
      console.warn('Could not read the server configuration', error);
      this.answered.set(false);
    }
  }
}
