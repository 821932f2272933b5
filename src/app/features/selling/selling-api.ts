import { HttpClient, HttpEventType, HttpXhrBackend, HttpXsrfTokenExtractor } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { filter, map, Observable } from 'rxjs';
import type { PhotoView } from '@shared/contracts/lots';
import type { EditableLot, FarmProfile, FarmProfileInput, LotFormStep, PhotoOrder, ReportReadingResponse, SellerLotRow } from '@shared/contracts/selling';
import type { ForageEvaluation } from '@shared/forage';

/** Upload progress: `progress` 0–1 while sending, then `done` with the server's answer. */
export type UploadEvent<T> = { kind: 'progress'; progress: number } | { kind: 'done'; body: T };

/** The grower's side of the API: farm, lots, steps, uploads. The only HTTP in the selling feature. */
@Injectable({ providedIn: 'root' })
export class SellingApi {
  private readonly http = inject(HttpClient);
  /**
   * Uploads go through XMLHttpRequest: the app's fetch-based client cannot report upload progress.
   * This client skips the interceptors, so the CSRF header is added here.
   */
  private readonly xhr = new HttpClient(inject(HttpXhrBackend));
  private readonly xsrf = inject(HttpXsrfTokenExtractor);

  readonly templateUrl = '/api/selling/analysis-template.csv';

  myFarm(): Observable<{ farm: FarmProfile | null }> {
    return this.http.get<{ farm: FarmProfile | null }>('/api/farms/mine');
  }
  saveFarm(input: FarmProfileInput): Observable<{ farm: FarmProfile }> {
    return this.http.put<{ farm: FarmProfile }>('/api/farms/mine', input);
  }
  payoutLink(): Observable<{ url: string }> {
    return this.http.post<{ url: string }>('/api/farms/mine/payouts/link', {});
  }
  refreshPayouts(): Observable<{ farm: FarmProfile }> {
    return this.http.post<{ farm: FarmProfile }>('/api/farms/mine/payouts/refresh', {});
  }

  myLots(): Observable<{ items: SellerLotRow[] }> {
    return this.http.get<{ items: SellerLotRow[] }>('/api/selling/lots');
  }
  lot(id: number): Observable<EditableLot> {
    return this.http.get<EditableLot>(`/api/selling/lots/${id}`);
  }
  create(lotStep: object): Observable<EditableLot> {
    return this.http.post<EditableLot>('/api/selling/lots', lotStep);
  }
  saveStep(id: number, step: LotFormStep, body: object): Observable<EditableLot> {
    return this.http.put<EditableLot>(`/api/selling/lots/${id}/${step}`, body);
  }
  orderPhotos(id: number, order: PhotoOrder): Observable<EditableLot> {
    return this.http.put<EditableLot>(`/api/selling/lots/${id}/photo-order`, order);
  }
  removePhoto(id: number, photoId: number): Observable<EditableLot> {
    return this.http.delete<EditableLot>(`/api/selling/lots/${id}/photos/${photoId}`);
  }
  act(id: number, action: 'submit' | 'withdraw' | 'relist' | 'copy'): Observable<EditableLot> {
    return this.http.post<EditableLot>(`/api/selling/lots/${id}/${action}`, {});
  }
  /** Reads a lab report PDF's values without keeping the file (the grower confirms them in the form). */
  readReport(file: File): Observable<ReportReadingResponse> {
    const body = new FormData();
    body.append('report', file);
    return this.http.post<ReportReadingResponse>('/api/uploads/report-reading', body);
  }

  evaluate(request: object): Observable<ForageEvaluation> {
    return this.http.post<ForageEvaluation>('/api/forage/evaluate', request);
  }

  uploadPhoto(id: number, file: File): Observable<UploadEvent<{ photos: PhotoView[] }>> {
    const body = new FormData();
    body.append('photos', file, file.name);
    return this.upload(`/api/uploads/lots/${id}/photos`, body);
  }
  uploadReport(id: number, file: File): Observable<UploadEvent<{ reportFile: { id: number; originalName: string } }>> {
    const body = new FormData();
    body.append('report', file, file.name);
    return this.upload(`/api/uploads/lots/${id}/report`, body);
  }

  private upload<T>(url: string, body: FormData): Observable<UploadEvent<T>> {
    const token = this.xsrf.getToken();
    const headers: Record<string, string> = token ? { 'X-XSRF-TOKEN': token } : {};
    return this.xhr.post<T>(url, body, { reportProgress: true, observe: 'events', headers }).pipe(
      filter((e) => e.type === HttpEventType.UploadProgress || e.type === HttpEventType.Response),
      map((e): UploadEvent<T> =>
        e.type === HttpEventType.UploadProgress ? { kind: 'progress', progress: e.total ? e.loaded / e.total : 0 } : { kind: 'done', body: (e as { body: T }).body },
      ),
    );
  }
}
