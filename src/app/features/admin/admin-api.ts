import { HttpClient, HttpParams } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { Observable } from 'rxjs';
import type { AdminOverview, AdminUserRow, AuditRow } from '@shared/contracts/admin';
import type { UserRole } from '@shared/contracts/auth';
import type { ClaimView, ResolveClaim } from '@shared/contracts/claims';
import type { PlatformSettings } from '@shared/contracts/platform-settings';
import type { BatchView, GrowerPayoutDue } from '@shared/contracts/payouts';

/** The admin console's door to the API: overview, payouts, claims, users, settings, audit. */
@Injectable({ providedIn: 'root' })
export class AdminApi {
  private readonly http = inject(HttpClient);

  overview(): Observable<AdminOverview> {
    return this.http.get<AdminOverview>('/api/admin/overview');
  }
  payoutsDue(): Observable<{ items: GrowerPayoutDue[] }> {
    return this.http.get<{ items: GrowerPayoutDue[] }>('/api/admin/payouts/due');
  }
  batches(): Observable<{ items: BatchView[] }> {
    return this.http.get<{ items: BatchView[] }>('/api/admin/payouts/batches');
  }
  createBatch(requestKey: string, farmIds: number[]): Observable<BatchView> {
    return this.http.post<BatchView>('/api/admin/payouts/batches', { requestKey, farmIds });
  }
  settle(batchId: number): Observable<BatchView> {
    return this.http.post<BatchView>(`/api/admin/payouts/batches/${batchId}/settle`, {});
  }
  retryPayout(payoutId: number): Observable<BatchView> {
    return this.http.post<BatchView>(`/api/admin/payouts/${payoutId}/retry`, {});
  }
  statementUrl(farmId: number): string {
    return `/api/admin/payouts/statement.csv?farmId=${farmId}`;
  }
  claims(): Observable<{ items: ClaimView[] }> {
    return this.http.get<{ items: ClaimView[] }>('/api/admin/claims');
  }
  claim(id: number): Observable<ClaimView> {
    return this.http.get<ClaimView>(`/api/admin/claims/${id}`);
  }
  resolveClaim(id: number, decision: ResolveClaim): Observable<ClaimView> {
    return this.http.post<ClaimView>(`/api/admin/claims/${id}/resolve`, decision);
  }
  users(q: string, role: UserRole | ''): Observable<{ items: AdminUserRow[] }> {
    let params = new HttpParams();
    if (q) params = params.set('q', q);
    if (role) params = params.set('role', role);
    return this.http.get<{ items: AdminUserRow[] }>('/api/admin/users', { params });
  }
  changeRole(id: number, role: UserRole, reason: string): Observable<AdminUserRow> {
    return this.http.post<AdminUserRow>(`/api/admin/users/${id}/role`, { role, reason });
  }
  suspend(id: number, reason: string): Observable<AdminUserRow> {
    return this.http.post<AdminUserRow>(`/api/admin/users/${id}/suspend`, { reason });
  }
  reinstate(id: number, reason: string): Observable<AdminUserRow> {
    return this.http.post<AdminUserRow>(`/api/admin/users/${id}/reinstate`, { reason });
  }
  settings(): Observable<PlatformSettings> {
    return this.http.get<PlatformSettings>('/api/admin/settings');
  }
  saveSettings(settings: PlatformSettings): Observable<PlatformSettings> {
    return this.http.put<PlatformSettings>('/api/admin/settings', settings);
  }
  audit(): Observable<{ items: AuditRow[] }> {
    return this.http.get<{ items: AuditRow[] }>('/api/admin/audit');
  }
}
