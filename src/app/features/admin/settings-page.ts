import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { firstValueFrom } from 'rxjs';
import { CLAIM_NUTRIENTS, DEFAULT_TOLERANCES, type PlatformSettings } from '@shared/contracts/platform-settings';
import { READABLE_FIELD_LABELS } from '@shared/contracts/report-reading';
import { apiErrorMessage } from '../../core/api-error';
import { AdminApi } from './admin-api';
import { AdminTabs } from './admin-tabs';

/** Platform settings: fee, acceptance and claim windows, retest tolerances (validated by the API, audited). */
@Component({
  selector: 'app-settings-page',
  imports: [AdminTabs, FormsModule, MatButton],
  template: `
    <div class="bp-page">
      <app-admin-tabs />
      <h1>Settings</h1>
      @if (s(); as v) {
        <form (ngSubmit)="save(v)">
          <p class="row"><label>Platform fee on the hay (basis points; 300 = 3 %) <input type="number" name="fee" [(ngModel)]="v.platformFeeBps" /></label></p>
          <p class="row"><label>Acceptance window (days after delivery) <input type="number" name="acc" [(ngModel)]="v.acceptanceDays" /></label>
            <label>Claim window (days after delivery) <input type="number" name="claim" [(ngModel)]="v.claimDays" /></label></p>
          <h2>Retest tolerances (percentage units, dry-matter basis)</h2>
          <table aria-label="Retest tolerances">
            <thead><tr><th scope="col">Nutrient</th><th scope="col">Tolerance ±</th><th scope="col">Default and its source</th></tr></thead>
            <tbody>
              @for (n of nutrients; track n) {
                <tr><th scope="row">{{ labels[n].label }}</th><td><input type="number" step="0.01" [name]="n" [(ngModel)]="v.tolerances[n]" [attr.aria-label]="'Tolerance for ' + labels[n].label" /></td><td>{{ defaults[n].units }} — {{ defaults[n].source }}</td></tr>
              }
            </tbody>
          </table>
          @if (error()) { <div class="bp-error-box" role="alert">{{ error() }}</div> }
          @if (saved()) { <p role="status">Saved. The change is in the audit trail.</p> }
          <button mat-flat-button type="submit">Save settings</button>
        </form>
      } @else if (!error()) { <p>Loading…</p> } @else { <div class="bp-error-box" role="alert">{{ error() }}</div> }
    </div>
  `,
  styleUrl: './admin-tables.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SettingsPage {
  private readonly api = inject(AdminApi);
  protected readonly nutrients = CLAIM_NUTRIENTS;
  protected readonly labels = READABLE_FIELD_LABELS;
  protected readonly defaults = DEFAULT_TOLERANCES;
  protected readonly s = signal<PlatformSettings | null>(null);
  protected readonly error = signal('');
  protected readonly saved = signal(false);

  constructor() {
    firstValueFrom(this.api.settings()).then((v) => this.s.set(structuredClone(v)), (e) => this.error.set(apiErrorMessage(e)));
  }

  protected async save(v: PlatformSettings): Promise<void> {
    this.error.set('');
    this.saved.set(false);
    try {
      this.s.set(structuredClone(await firstValueFrom(this.api.saveSettings(v))));
      this.saved.set(true);
    } catch (e) {
      this.error.set(apiErrorMessage(e));
    }
  }
}
