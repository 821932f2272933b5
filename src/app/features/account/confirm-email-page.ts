import { afterNextRender, ChangeDetectionStrategy, Component, inject, input, signal } from '@angular/core';
import { RouterLink } from '@angular/router';
import { apiErrorMessage } from '../../core/api-error';
import { Session } from '../../core/session';

/** Where the link in the confirmation e-mail leads: it sends the token once, in the browser, and says what happened. */
@Component({
  selector: 'app-confirm-email-page',
  imports: [RouterLink],
  template: `
    <div class="bp-page narrow">
      <h1>Confirm your e-mail address</h1>
      @if (outcome(); as o) {
        <div [class]="o.ok ? 'bp-info-box' : 'bp-error-box'" [attr.role]="o.ok ? 'status' : 'alert'">{{ o.message }}</div>
        <p><a routerLink="/hay">Go to the hay catalogue</a></p>
      } @else {
        <p role="status">Confirming…</p>
      }
    </div>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class ConfirmEmailPage {
  private readonly session = inject(Session);
  /** From the link (`?token=`). */
  readonly token = input<string>();
  protected readonly outcome = signal<{ ok: boolean; message: string } | null>(null);

  constructor() {
    // In the browser only: a server render (or a link preview fetching the page) never uses the token.
    afterNextRender(() => void this.confirm());
  }

  private async confirm(): Promise<void> {
    try {
      const answer = await this.session.confirmEmail(this.token() ?? '');
      this.outcome.set({ ok: true, message: answer.message });
    } catch (error) {
      this.outcome.set({ ok: false, message: apiErrorMessage(error) });
    }
  }
}
