import { afterNextRender, ChangeDetectionStrategy, Component, ElementRef, inject, signal, viewChild } from '@angular/core';
import { RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import type { AdminOverview } from '@shared/contracts/admin';
import { DatePipe, DecimalPipe } from '@angular/common';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { apiErrorMessage } from '../../core/api-error';
import { AdminApi } from './admin-api';
import { AdminTabs } from './admin-tabs';

/** The admin's first look: sales and orders per week, and what is waiting on an admin. */
@Component({
  selector: 'app-overview-page',
  imports: [RouterLink, AdminTabs, DatePipe, DecimalPipe, MoneyPipe],
  template: `
    <div class="bp-page">
      <app-admin-tabs />
      <h1>Overview</h1>
      @if (error()) { <div class="bp-error-box" role="alert">{{ error() }}</div> }
      @if (data(); as d) {
        <ul class="cards" aria-label="Waiting on an admin">
          <li><a routerLink="/admin"><strong>{{ d.lotsWaiting }}</strong> lot{{ d.lotsWaiting === 1 ? '' : 's' }} waiting for review</a></li>
          <li><a routerLink="/admin/payouts"><strong>{{ d.payoutsDue.totalCents | money: 0 }}</strong> due to {{ d.payoutsDue.growers }} grower{{ d.payoutsDue.growers === 1 ? '' : 's' }}@if (d.payoutsDue.held > 0) { ({{ d.payoutsDue.held }} held) }</a></li>
          <li><a routerLink="/admin/claims"><strong>{{ d.openClaims }}</strong> open claim{{ d.openClaims === 1 ? '' : 's' }}</a></li>
        </ul>
        <table class="bp-num weeks" aria-label="Sales and orders per week">
          <thead><tr><th scope="col">Week of</th><th scope="col">Paid orders</th><th scope="col">Sales (less refunds)</th></tr></thead>
          <tbody>@for (w of d.weeks; track w.weekStart) { <tr><th scope="row">{{ w.weekStart | date: 'mediumDate' : 'UTC' }}</th><td>{{ w.orders | number }}</td><td>{{ w.salesCents | money: 0 }}</td></tr> }</tbody>
        </table>
      } @else if (!error()) { <p>Loading…</p> }
      <h2 [hidden]="!data()">Sales and orders per week</h2>
      <div class="chart" [hidden]="!data()"><canvas #chart aria-label="Sales and paid orders per week, last 12 weeks" role="img"></canvas></div>
    </div>
  `,
  styles: `
    .cards { list-style: none; padding: 0; display: grid; grid-template-columns: repeat(auto-fit, minmax(220px, 1fr)); gap: 12px; }
    .cards a { display: block; padding: 16px; border-radius: 10px; background: var(--mat-sys-surface-container); text-decoration: none; color: inherit; }
    .cards strong { font-size: 1.6rem; display: block; }
    .chart { position: relative; height: 280px; max-width: 900px; }
    .weeks { margin-top: 16px; max-width: 520px; }
    .weeks td, .weeks th { padding: 2px 8px; text-align: right; }
    .weeks th[scope='row'] { text-align: left; font-weight: 400; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class OverviewPage {
  private readonly api = inject(AdminApi);
  private readonly canvas = viewChild<ElementRef<HTMLCanvasElement>>('chart');
  protected readonly data = signal<AdminOverview | null>(null);
  protected readonly error = signal('');

  constructor() {
    // The chart is drawn in the browser only (chart.js needs a canvas); the table carries the same figures for SSR and screen readers.
    afterNextRender(() => void this.load());
  }

  private async load(): Promise<void> {
    try {
      const d = await firstValueFrom(this.api.overview());
      this.data.set(d);
      const { Chart, registerables } = await import('chart.js');
      Chart.register(...registerables);
      const el = this.canvas()?.nativeElement;
      if (!el) return;
      new Chart(el, {
        data: {
          labels: d.weeks.map((w) => w.weekStart.slice(5)),
          datasets: [
            { type: 'bar', label: 'Sales ($)', data: d.weeks.map((w) => w.salesCents / 100), yAxisID: 'sales' },
            { type: 'line', label: 'Paid orders', data: d.weeks.map((w) => w.orders), yAxisID: 'orders' },
          ],
        },
        options: { maintainAspectRatio: false, animation: false, scales: { sales: { position: 'left', beginAtZero: true }, orders: { position: 'right', beginAtZero: true, grid: { drawOnChartArea: false } } } },
      });
    } catch (e) {
      this.error.set(apiErrorMessage(e));
    }
  }
}
