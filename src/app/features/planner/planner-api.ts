import { HttpClient, HttpParams } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { map, Observable } from 'rxjs';
import type { ComparedLot, LotComparison } from '@shared/contracts/compare';
import type { LotSearchResult } from '@shared/contracts/lots';
import type { PurchasePlanRequest, PurchasePlanResponse } from '@shared/contracts/planner';

/** The planner's door to the API. */
@Injectable({ providedIn: 'root' })
export class PlannerApi {
  private readonly http = inject(HttpClient);

  /** Listed lots to choose from, cheapest first. */
  lotOptions(): Observable<{ id: number; title: string; farmName: string }[]> {
    const params = new HttpParams({ fromObject: { sort: 'price', pageSize: '100' } });
    return this.http.get<LotSearchResult>('/api/lots', { params }).pipe(map((r) => r.items.map(({ id, title, farmName }) => ({ id, title, farmName }))));
  }

  /** One lot's analysis and bale weight (via the comparison endpoint, which carries horse DE). */
  lotFigures(id: number): Observable<ComparedLot | null> {
    return this.http.get<LotComparison>('/api/lots/compare', { params: { ids: String(id) } }).pipe(map((r) => r.items[0] ?? null));
  }

  purchasePlan(request: PurchasePlanRequest): Observable<PurchasePlanResponse> {
    return this.http.post<PurchasePlanResponse>('/api/planner/purchase-plan', request);
  }
}
