import { HttpClient } from '@angular/common/http';
import { computed, inject, Injectable, signal } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type { SessionUser, SignIn, SignUp, SignUpAnswer, UserRole, VerifyEmailAnswer } from '@shared/contracts/auth';

/** Who is signed in. The only place that calls the auth API. */
@Injectable({ providedIn: 'root' })
export class Session {
  private readonly http = inject(HttpClient);
  private readonly current = signal<SessionUser | null>(null);

  readonly user = this.current.asReadonly();
  readonly signedIn = computed(() => this.current() !== null);
  readonly role = computed<UserRole | null>(() => this.current()?.role ?? null);

  async load(): Promise<void> {
    try {
      const res = await firstValueFrom(this.http.get<{ user: SessionUser | null }>('/api/auth/me'));
      this.current.set(res.user);
    } catch {
      this.current.set(null);
    }
  }

  async signIn(input: SignIn): Promise<SessionUser> {
    const res = await firstValueFrom(this.http.post<{ user: SessionUser }>('/api/auth/sign-in', input));
    this.current.set(res.user);
    return res.user;
  }

  /** The answer is the same whether or not the address was new; a new account is signed in afterwards. */
  async signUp(input: SignUp): Promise<SignUpAnswer> {
    const answer = await firstValueFrom(this.http.post<SignUpAnswer>('/api/auth/sign-up', input));
    await this.load();
    return answer;
  }

  /** Opens a confirmation link's token; the signed-in user's state follows. */
  async confirmEmail(token: string): Promise<VerifyEmailAnswer> {
    const answer = await firstValueFrom(this.http.post<VerifyEmailAnswer>('/api/auth/confirm-email', { token }));
    if (this.current()) await this.load();
    return answer;
  }

  /** Sends the signed-in user a new confirmation link. */
  async resendConfirmation(): Promise<string> {
    const res = await firstValueFrom(this.http.post<{ message: string }>('/api/auth/confirmation-link', {}));
    return res.message;
  }

  async signOut(): Promise<void> {
    await firstValueFrom(this.http.post('/api/auth/sign-out', {}));
    this.current.set(null);
  }
}
