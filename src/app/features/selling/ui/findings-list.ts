import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import type { Finding } from '@shared/forage';
import { Icon } from '../../../shared/ui/icon';

const ICONS = { error: 'error', warning: 'warning', info: 'info' } as const;

/** The engine's findings, most serious first, each coloured by severity. */
@Component({
  selector: 'app-findings-list',
  imports: [Icon],
  template: `
    @if (findings().length > 0) {
      <ul class="findings" [attr.aria-label]="label()">
        @for (f of sorted(); track f.code) {
          <li [class]="f.severity"><app-icon [name]="icons[f.severity]" /><span>{{ f.message }}</span></li>
        }
      </ul>
    } @else if (emptyText()) {
      <p class="ok"><app-icon name="check_circle" /> {{ emptyText() }}</p>
    }
  `,
  styles: `
    .findings { list-style: none; padding: 0; margin: 8px 0; display: grid; gap: 6px; }
    li { display: flex; gap: 8px; align-items: flex-start; padding: 8px 10px; border-radius: 6px; }
    li.error { background: var(--bp-error-bg); color: var(--bp-error); }
    li.warning { background: var(--bp-warn-bg); color: var(--bp-warn); }
    li.info { background: var(--bp-info-bg); color: var(--bp-info); }
    li span { color: var(--mat-sys-on-surface); }
    li app-icon { flex: none; }
    .ok { display: flex; gap: 8px; align-items: center; color: var(--bp-ok); }
    .ok app-icon { flex: none; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FindingsList {
  readonly findings = input.required<Finding[]>();
  readonly label = input('Findings');
  readonly emptyText = input('');
  protected readonly icons = ICONS;
  protected sorted(): Finding[] {
    const rank = { error: 0, warning: 1, info: 2 };
    return [...this.findings()].sort((a, b) => rank[a.severity] - rank[b.severity]);
  }
}
