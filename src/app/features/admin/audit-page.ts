import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { DatePipe, JsonPipe } from '@angular/common';
import { firstValueFrom } from 'rxjs';
import type { AuditRow } from '@shared/contracts/admin';
import { apiErrorMessage } from '../../core/api-error';
import { AdminApi } from './admin-api';
import { AdminTabs } from './admin-tabs';

/** The audit trail, newest first: who did what, when, and what changed. It can be added to, never edited. */
@Component({
  selector: 'app-audit-page',
  imports: [AdminTabs, DatePipe, JsonPipe],
  template: `
    <div class="bp-page">
      <app-admin-tabs />
      <h1>Audit trail</h1>
      @if (error()) { <div class="bp-error-box" role="alert">{{ error() }}</div> }
      <table aria-label="Audit trail">
        <thead><tr><th scope="col">When (UTC)</th><th scope="col">What</th><th scope="col">Who</th><th scope="col">On</th><th scope="col">Changed (from → to)</th><th scope="col">Details</th></tr></thead>
        <tbody>
          @for (r of rows(); track r.id) {
            <tr><td><time [attr.datetime]="r.at">{{ r.at | date: 'medium' : 'UTC' }}</time></td><td>{{ r.label }}</td><td>{{ r.by }}</td><td>{{ r.entityType }} {{ r.entityId }}</td>
              <td>@for (c of r.changes; track c.field) { <div>{{ c.label }}: {{ c.from }} → {{ c.to }}</div> }</td><td><code>{{ r.data | json }}</code></td></tr>
          }
        </tbody>
      </table>
    </div>
  `,
  styleUrl: './admin-tables.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AuditPage {
  private readonly api = inject(AdminApi);
  protected readonly rows = signal<AuditRow[]>([]);
  protected readonly error = signal('');

  constructor() {
    firstValueFrom(this.api.audit()).then((r) => this.rows.set(r.items), (e) => this.error.set(apiErrorMessage(e)));
  }
}
