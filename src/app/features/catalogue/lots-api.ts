import { HttpClient, HttpParams } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { Observable } from 'rxjs';
import type { LotDetail, LotSearchResult } from '@shared/contracts/lots';

/** The catalogue's only door to the API. */
@Injectable({ providedIn: 'root' })
export class LotsApi {
  private readonly http = inject(HttpClient);

  search(query: Record<string, string>): Observable<LotSearchResult> {
    return this.http.get<LotSearchResult>('/api/lots', { params: new HttpParams({ fromObject: query }) });
  }

  get(id: number): Observable<LotDetail> {
    return this.http.get<LotDetail>(`/api/lots/${id}`);
  }
}
