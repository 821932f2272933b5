import { HttpClient, HttpParams } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { Observable } from 'rxjs';
import type { LotComparison } from '@shared/contracts/compare';

/** The comparison's door to the API. */
@Injectable({ providedIn: 'root' })
export class CompareApi {
  private readonly http = inject(HttpClient);

  compare(query: { ids: readonly number[]; zip?: string; tons?: string }): Observable<LotComparison> {
    let params = new HttpParams().set('ids', query.ids.join(','));
    if (query.zip) params = params.set('zip', query.zip);
    if (query.tons) params = params.set('tons', query.tons);
    return this.http.get<LotComparison>('/api/lots/compare', { params });
  }
}
