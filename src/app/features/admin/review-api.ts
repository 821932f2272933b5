import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { Observable } from 'rxjs';
import type { ReviewLotView, ReviewQueueRow } from '@shared/contracts/selling';

/** The review desk's door to the API (admins only). */
@Injectable({ providedIn: 'root' })
export class ReviewApi {
  private readonly http = inject(HttpClient);

  queue(): Observable<{ items: ReviewQueueRow[] }> {
    return this.http.get<{ items: ReviewQueueRow[] }>('/api/review/queue');
  }
  lot(id: number): Observable<ReviewLotView> {
    return this.http.get<ReviewLotView>(`/api/review/lots/${id}`);
  }
  /** Approves the revision the admin was shown; the API answers 409 if the grower changed the lot since. */
  approve(id: number, revision: number): Observable<ReviewLotView> {
    return this.http.post<ReviewLotView>(`/api/review/lots/${id}/approve`, { revision });
  }
  returnToGrower(id: number, reason: string): Observable<ReviewLotView> {
    return this.http.post<ReviewLotView>(`/api/review/lots/${id}/return`, { reason });
  }
}
