import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { Observable } from 'rxjs';
import type { ClaimView, OpenClaim } from '@shared/contracts/claims';

/** The buyer's and grower's door to quality claims (admins decide them through AdminApi). */
@Injectable({ providedIn: 'root' })
export class ClaimsApi {
  private readonly http = inject(HttpClient);

  forOrder(orderId: number): Observable<{ items: ClaimView[] }> {
    return this.http.get<{ items: ClaimView[] }>('/api/claims', { params: { orderId } });
  }
  open(claim: OpenClaim): Observable<ClaimView> {
    return this.http.post<ClaimView>('/api/claims', claim);
  }
  attachRetest(claimId: number, pdf: File): Observable<ClaimView> {
    const form = new FormData();
    form.append('report', pdf);
    return this.http.post<ClaimView>(`/api/claims/${claimId}/retest`, form);
  }
}
