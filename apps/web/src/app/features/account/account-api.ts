import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { SignUpBody } from '@barwright/contracts';
import { firstValueFrom } from 'rxjs';

/** Account calls that do not change who is signed in (those live in AuthStore). */
@Injectable({ providedIn: 'root' })
export class AccountApi {
  private readonly http = inject(HttpClient);

  /** Creates the account and sends the verification mail; the new account is not signed in. */
  async signUp(body: SignUpBody): Promise<void> {
    await firstValueFrom(this.http.post('/api/auth/sign-up', body));
  }

  async verifyEmail(token: string): Promise<void> {
    await firstValueFrom(this.http.post('/api/auth/verify', { token }));
  }

  async resendVerification(): Promise<void> {
    await firstValueFrom(this.http.post('/api/auth/resend-verification', {}));
  }

  /** Always accepted, whether or not the address has an account. */
  async requestPasswordReset(email: string): Promise<void> {
    await firstValueFrom(this.http.post('/api/auth/password-reset/request', { email }));
  }

  async confirmPasswordReset(token: string, password: string): Promise<void> {
    await firstValueFrom(this.http.post('/api/auth/password-reset/confirm', { token, password }));
  }
}
