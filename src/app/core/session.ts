import { HttpClient } from '@angular/common/http';
import { computed, inject, Injectable, signal } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type { SessionUser, SignIn, SignUp, UserRole } from '@shared/contracts/auth';

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

  async signUp(input: SignUp): Promise<SessionUser> {
    const res = await firstValueFrom(this.http.post<{ user: SessionUser }>('/api/auth/sign-up', input));
    this.current.set(res.user);
    return res.user;
  }

  async signOut(): Promise<void> {
    await firstValueFrom(this.http.post('/api/auth/sign-out', {}));
    this.current.set(null);
  }
}
