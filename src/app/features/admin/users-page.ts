import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { DatePipe } from '@angular/common';
import { FormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { firstValueFrom, type Observable } from 'rxjs';
import type { AdminUserRow } from '@shared/contracts/admin';
import { USER_ROLES, type UserRole } from '@shared/contracts/auth';
import { apiErrorMessage } from '../../core/api-error';
import { AdminApi } from './admin-api';
import { AdminTabs } from './admin-tabs';

type Pending = { user: AdminUserRow; action: 'suspend' | 'reinstate' | 'role'; role?: UserRole };

/** Users: search, change a role, suspend (signs them out everywhere at once) and reinstate, each with a reason. */
@Component({
  selector: 'app-users-page',
  imports: [AdminTabs, DatePipe, FormsModule, MatButton],
  template: `
    <div class="bp-page">
      <app-admin-tabs />
      <h1>Users</h1>
      <form class="row" (ngSubmit)="search()">
        <label>Name or e-mail <input name="q" [(ngModel)]="q" /></label>
        <label>Role <select name="role" [(ngModel)]="role"><option value="">any</option>@for (r of roles; track r) { <option [value]="r">{{ r }}</option> }</select></label>
        <button mat-stroked-button type="submit">Search</button>
      </form>
      @if (error()) { <div class="bp-error-box" role="alert">{{ error() }}</div> }
      <table aria-label="Users">
        <thead><tr><th scope="col">Name</th><th scope="col">E-mail</th><th scope="col">Role</th><th scope="col">Since</th><th scope="col">State</th><th scope="col">Change</th></tr></thead>
        <tbody>
          @for (u of users(); track u.id) {
            <tr>
              <td>{{ u.displayName }}</td><td>{{ u.email }}</td><td>{{ u.role }}</td><td>{{ u.createdAt | date: 'mediumDate' : 'UTC' }}</td>
              <td>{{ u.suspendedAt ? 'suspended ' + (u.suspendedAt | date: 'mediumDate' : 'UTC') + ': ' + u.suspendedReason : 'active' }}</td>
              <td class="row">
                <select [attr.aria-label]="'New role for ' + u.email" #r (change)="pending.set({ user: u, action: 'role', role: $any(r.value) })">
                  @for (x of roles; track x) { <option [value]="x" [selected]="x === u.role">{{ x }}</option> }
                </select>
                @if (u.suspendedAt) { <button mat-stroked-button type="button" (click)="pending.set({ user: u, action: 'reinstate' })">Reinstate…</button> }
                @else { <button mat-stroked-button type="button" (click)="pending.set({ user: u, action: 'suspend' })">Suspend…</button> }
              </td>
            </tr>
          }
        </tbody>
      </table>
      @if (pending(); as p) {
        <div class="scrim"></div>
        <section class="confirm" role="alertdialog" aria-modal="true" aria-labelledby="user-title">
          <h2 id="user-title">{{ p.action === 'suspend' ? 'Suspend ' + p.user.email + '?' : p.action === 'reinstate' ? 'Reinstate ' + p.user.email + '?' : 'Make ' + p.user.email + ' a ' + p.role + '?' }}</h2>
          @if (p.action === 'suspend') { <p>They are signed out on every device at once and cannot sign in until reinstated.</p> }
          <label>Reason (kept in the audit trail) <textarea rows="2" cols="50" [(ngModel)]="reason" aria-label="Reason"></textarea></label>
          <div class="actions">
            <button mat-stroked-button type="button" (click)="pending.set(null)">Cancel</button>
            <button mat-flat-button type="button" (click)="apply(p)">Confirm</button>
          </div>
        </section>
      }
    </div>
  `,
  styleUrl: './admin-tables.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class UsersPage {
  private readonly api = inject(AdminApi);
  protected readonly roles = USER_ROLES;
  protected readonly users = signal<AdminUserRow[]>([]);
  protected readonly error = signal('');
  protected readonly pending = signal<Pending | null>(null);
  protected q = '';
  protected role: UserRole | '' = '';
  protected reason = '';

  constructor() {
    void this.search();
  }

  protected async search(): Promise<void> {
    await this.run(async () => this.users.set((await firstValueFrom(this.api.users(this.q, this.role))).items));
  }

  protected async apply(p: Pending): Promise<void> {
    const call: Observable<AdminUserRow> = p.action === 'suspend' ? this.api.suspend(p.user.id, this.reason) : p.action === 'reinstate' ? this.api.reinstate(p.user.id, this.reason) : this.api.changeRole(p.user.id, p.role!, this.reason);
    await this.run(async () => {
      await firstValueFrom(call);
      this.pending.set(null);
      this.reason = '';
    });
    await this.search();
  }

  private async run(work: () => Promise<void>): Promise<void> {
    this.error.set('');
    try {
      await work();
    } catch (e) {
      this.error.set(apiErrorMessage(e));
    }
  }
}
