import { HttpClient } from '@angular/common/http';
import { computed, inject, Injectable, signal } from '@angular/core';
import type { Me, MeAnswer, Role, SignInBody, UpdateProfileBody } from '@barwright/contracts';
import { firstValueFrom } from 'rxjs';

/** Who is signed in. The server is the judge; this only mirrors its last answer. */
@Injectable({ providedIn: 'root' })
export class AuthStore {
  private readonly http = inject(HttpClient);
  private readonly current = signal<Me | null>(null);
  private readonly checked = signal(false);

  /** The signed-in account, or null for a visitor. */
  readonly me = this.current.asReadonly();
  /** False until the first `GET /api/auth/me` has answered. */
  readonly loaded = this.checked.asReadonly();
  readonly signedIn = computed(() => this.current() !== null);
  readonly role = computed<Role | null>(() => this.current()?.role ?? null);
  readonly isAdmin = computed(() => this.role() === 'admin');

  hasRole(roles: readonly Role[]): boolean {
    const role = this.role();
    return role !== null && roles.includes(role);
  }

  /** Asks the server who we are (null for a visitor). Never throws: an unreachable server leaves us signed out. */
  async load(): Promise<void> {
    try {
      this.current.set(await firstValueFrom(this.http.get<MeAnswer>('/api/auth/me')));
    } catch (error) {
      this.current.set(null);
      console.warn('Could not ask who is signed in', error);
    } finally {
      this.checked.set(true);
    }
  }

  async signIn(body: SignInBody): Promise<Me> {
    const me = await firstValueFrom(this.http.post<Me>('/api/auth/sign-in', body));
    this.current.set(me);
    return me;
  }

  async signOut(): Promise<void> {
    try {
      await firstValueFrom(this.http.post<void>('/api/auth/sign-out', {}));
    } finally {
      this.current.set(null);
    }
  }

  async updateProfile(patch: UpdateProfileBody): Promise<Me> {
    const me = await firstValueFrom(this.http.patch<Me>('/api/auth/me', patch));
    this.current.set(me);
    return me;
  }

  /** The session ended on the server (signed out elsewhere, suspended, expired). */
  forget(): void {
    this.current.set(null);
  }
}
