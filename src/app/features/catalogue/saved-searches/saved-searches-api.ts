import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { map, Observable } from 'rxjs';
import type { SavedSearchCreate, SavedSearchView } from '@shared/contracts/saved-searches';

/** Saved searches' door to the API (signed-in buyers only). */
@Injectable({ providedIn: 'root' })
export class SavedSearchesApi {
  private readonly http = inject(HttpClient);

  list(): Observable<SavedSearchView[]> {
    return this.http.get<{ items: SavedSearchView[] }>('/api/saved-searches').pipe(map((r) => r.items));
  }

  save(input: SavedSearchCreate): Observable<SavedSearchView> {
    return this.http.post<SavedSearchView>('/api/saved-searches', input);
  }

  remove(id: number): Observable<void> {
    return this.http.delete<void>(`/api/saved-searches/${id}`);
  }
}
