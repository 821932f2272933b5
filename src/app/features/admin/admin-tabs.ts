import { ChangeDetectionStrategy, Component } from '@angular/core';
import { RouterLink, RouterLinkActive } from '@angular/router';

/** The admin console's own navigation, at the top of each admin page. */
@Component({
  selector: 'app-admin-tabs',
  imports: [RouterLink, RouterLinkActive],
  template: `
    <nav class="tabs" aria-label="Admin console">
      @for (t of tabs; track t.path) {
        <a [routerLink]="t.path" routerLinkActive="active" [routerLinkActiveOptions]="{ exact: t.path === '/admin' }" ariaCurrentWhenActive="page">{{ t.label }}</a>
      }
    </nav>
  `,
  styles: `
    .tabs { display: flex; flex-wrap: wrap; gap: 4px; margin-bottom: 16px; border-bottom: 1px solid var(--mat-sys-outline-variant); }
    a { padding: 8px 12px; text-decoration: none; color: var(--mat-sys-on-surface-variant); border-bottom: 3px solid transparent; }
    a.active { color: var(--mat-sys-primary); border-bottom-color: var(--mat-sys-primary); font-weight: 600; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class AdminTabs {
  protected readonly tabs = [
    { path: '/admin/overview', label: 'Overview' },
    { path: '/admin', label: 'Review desk' },
    { path: '/admin/payouts', label: 'Payouts' },
    { path: '/admin/claims', label: 'Claims' },
    { path: '/admin/users', label: 'Users' },
    { path: '/admin/settings', label: 'Settings' },
    { path: '/admin/audit', label: 'Audit trail' },
  ];
}
