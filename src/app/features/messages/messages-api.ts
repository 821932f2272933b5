import { HttpClient } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { map, Observable } from 'rxjs';
import type { OrderThread, ThreadDetail, ThreadView } from '@shared/contracts/messages';

/** Messages' door to the API (signed-in buyers and growers; admins read an order's). */
@Injectable({ providedIn: 'root' })
export class MessagesApi {
  private readonly http = inject(HttpClient);

  inbox(): Observable<ThreadView[]> {
    return this.http.get<{ items: ThreadView[] }>('/api/messages/threads').pipe(map((r) => r.items));
  }

  thread(id: number): Observable<ThreadDetail> {
    return this.http.get<ThreadDetail>(`/api/messages/threads/${id}`);
  }

  reply(id: number, body: string): Observable<ThreadDetail> {
    return this.http.post<ThreadDetail>(`/api/messages/threads/${id}`, { body });
  }

  aboutLot(lotId: number): Observable<ThreadDetail | null> {
    return this.http.get<{ thread: ThreadDetail | null }>(`/api/messages/lots/${lotId}`).pipe(map((r) => r.thread));
  }

  writeAboutLot(lotId: number, body: string): Observable<ThreadDetail> {
    return this.http.post<ThreadDetail>(`/api/messages/lots/${lotId}`, { body });
  }

  aboutOrder(orderId: number): Observable<OrderThread> {
    return this.http.get<OrderThread>(`/api/messages/orders/${orderId}`);
  }

  writeAboutOrder(orderId: number, body: string): Observable<OrderThread> {
    return this.http.post<OrderThread>(`/api/messages/orders/${orderId}`, { body });
  }
}
