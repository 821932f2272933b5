import { ChangeDetectionStrategy, Component, inject } from '@angular/core';
import { toSignal } from '@angular/core/rxjs-interop';
import { DatePipe } from '@angular/common';
import { RouterLink } from '@angular/router';
import { catchError, map, of } from 'rxjs';
import type { ReviewQueueRow } from '@shared/contracts/selling';
import { apiErrorMessage } from '../../core/api-error';
import { ReviewApi } from './review-api';
import { AdminTabs } from './admin-tabs';
import { Icon } from '../../shared/ui/icon';

type QueueState = { status: 'loading' } | { status: 'ok'; items: ReviewQueueRow[] } | { status: 'error'; message: string };

/** Lots waiting for an admin to check their lab report, oldest first. */
@Component({
  selector: 'app-review-queue-page',
  imports: [RouterLink, Icon, AdminTabs, DatePipe],
  template: `
    <div class="bp-page">
      <app-admin-tabs />
      <h1>Review desk</h1>
      <p class="lead">Lots waiting for a check of the lab report against the values the grower entered, oldest first.</p>
      @switch (state().status) {
        @case ('loading') { <p>Loading…</p> }
        @case ('error') { <div class="bp-error-box" role="alert">{{ errorMessage() }}</div> }
        @default {
          @if (items().length === 0) { <p>Nothing is waiting. Well done.</p> }
          <ul class="queue" aria-label="Lots waiting for review">
            @for (row of items(); track row.id) {
              <li>
                <a [routerLink]="['/admin/lots', row.id]" class="title">{{ row.title }}</a>
                <span class="meta">{{ row.farmName }} · {{ row.growerEmail }} · submitted {{ row.submittedAt | date: 'medium' : 'UTC' }} UTC</span>
                <span class="meta">{{ row.labName ?? 'no lab' }}{{ row.labCertified ? ' (certified)' : row.labCertified === false ? ' (not certified)' : '' }}
                  @if (row.errorFindings > 0) { · <app-icon name="error" inline class="err" /> {{ row.errorFindings }} {{ row.errorFindings === 1 ? 'problem' : 'problems' }} }
                  @if (row.warningFindings > 0) { · <app-icon name="warning" inline class="warn" /> {{ row.warningFindings }} {{ row.warningFindings === 1 ? 'point to check' : 'points to check' }} }
                </span>
              </li>
            }
          </ul>
        }
      }
    </div>
  `,
  styles: `
    .lead { color: var(--mat-sys-on-surface-variant); }
    .queue { list-style: none; padding: 0; display: grid; gap: 10px; }
    .queue li { display: grid; gap: 2px; padding: 12px; border: 1px solid var(--mat-sys-outline-variant); border-radius: 8px; background: #fff; }
    .title { font-weight: 600; }
    .meta { color: var(--mat-sys-on-surface-variant); font-size: 0.9rem; }
    .err { color: var(--bp-error); } .warn { color: var(--bp-warn); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ReviewQueuePage {
  protected readonly state = toSignal(
    inject(ReviewApi)
      .queue()
      .pipe(
        map((r): QueueState => ({ status: 'ok', items: r.items })),
        catchError((e) => of<QueueState>({ status: 'error', message: apiErrorMessage(e) })),
      ),
    { initialValue: { status: 'loading' } as QueueState },
  );
  protected items(): ReviewQueueRow[] {
    const s = this.state();
    return s.status === 'ok' ? s.items : [];
  }
  protected errorMessage(): string {
    const s = this.state();
    return s.status === 'error' ? s.message : '';
  }
}
