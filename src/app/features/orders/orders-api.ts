import { HttpClient, HttpParams } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import type { Observable } from 'rxjs';
import type { CalendarDay, CreatedOrder, CreateOrder, DeliverySettings, ListCheckout, ListCheckoutResult, ListQuote, ListQuoteRequest, OrderQuote, OrderSummary, OrderView, WindowRequest } from '@shared/contracts/orders';

/** The orders feature's only door to the API. */
@Injectable({ providedIn: 'root' })
export class OrdersApi {
  private readonly http = inject(HttpClient);

  quote(query: { lotId: number; bales: number; method: string; deliveryZip?: string }): Observable<OrderQuote> {
    const params = new HttpParams({ fromObject: Object.fromEntries(Object.entries(query).filter(([, v]) => v !== undefined && v !== '')) as Record<string, string> });
    return this.http.get<OrderQuote>('/api/orders/quote', { params });
  }
  openDays(lotId: number): Observable<{ days: CalendarDay[]; pickupFromHour: number; pickupToHour: number; timeZone: string }> {
    return this.http.get<{ days: CalendarDay[]; pickupFromHour: number; pickupToHour: number; timeZone: string }>(`/api/orders/lots/${lotId}/open-days`);
  }
  place(order: CreateOrder): Observable<CreatedOrder> {
    return this.http.post<CreatedOrder>('/api/orders', order);
  }
  /** The hay list's figures: one order per grower, freight on each grower's combined loads. */
  quoteList(list: ListQuoteRequest): Observable<ListQuote> {
    return this.http.post<ListQuote>('/api/orders/quote-list', list);
  }
  /** Checks out the hay list: one order (hold and payment page) per grower, all held or none. */
  placeList(list: ListCheckout): Observable<ListCheckoutResult> {
    return this.http.post<ListCheckoutResult>('/api/orders/from-list', list);
  }
  get(id: number): Observable<OrderView> {
    return this.http.get<OrderView>(`/api/orders/${id}`);
  }
  mine(): Observable<{ items: OrderSummary[] }> {
    return this.http.get<{ items: OrderSummary[] }>('/api/orders/mine');
  }
  incoming(): Observable<{ items: OrderSummary[] }> {
    return this.http.get<{ items: OrderSummary[] }>('/api/orders/incoming');
  }
  cancel(id: number): Observable<OrderView> {
    return this.http.post<OrderView>(`/api/orders/${id}/cancel`, {});
  }
  askForDate(id: number, window: WindowRequest): Observable<OrderView> {
    return this.http.put<OrderView>(`/api/orders/${id}/window`, window);
  }
  offerDate(id: number, window: WindowRequest): Observable<OrderView> {
    return this.http.post<OrderView>(`/api/orders/${id}/offer-window`, window);
  }
  confirmDate(id: number): Observable<OrderView> {
    return this.http.post<OrderView>(`/api/orders/${id}/confirm-date`, {});
  }
  /** Marks the hay handed over, with the scale ticket's tons per line (sent as JSON beside the photo). */
  handOver(id: number, lines: { lineId: number; weighedTons: number }[], ticket: File | null): Observable<OrderView> {
    const form = new FormData();
    if (lines.length > 0) form.append('lines', JSON.stringify(lines));
    if (ticket) form.append('ticket', ticket);
    return this.http.post<OrderView>(`/api/orders/${id}/hand-over`, form);
  }
  accept(id: number): Observable<OrderView> {
    return this.http.post<OrderView>(`/api/orders/${id}/accept`, {});
  }
  calendar(from: string, days = 7): Observable<{ days: CalendarDay[]; timeZone: string }> {
    return this.http.get<{ days: CalendarDay[]; timeZone: string }>('/api/delivery-calendar', { params: { from, days } });
  }
  settings(): Observable<DeliverySettings> {
    return this.http.get<DeliverySettings>('/api/delivery-calendar/settings');
  }
  saveSettings(settings: DeliverySettings): Observable<DeliverySettings> {
    return this.http.put<DeliverySettings>('/api/delivery-calendar/settings', settings);
  }
}
