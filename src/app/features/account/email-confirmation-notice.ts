import { ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { apiErrorMessage } from '../../core/api-error';
import { Session } from '../../core/session';

/** For a signed-in user whose address is not confirmed: why it matters, and the link sent again. */
@Component({
  selector: 'app-email-confirmation-notice',
  imports: [MatButton],
  template: `
    @if (session.user(); as user) {
      @if (!user.emailVerified) {
        <div class="bp-info-box">
          <p><strong>E-mail not confirmed yet.</strong> Alerts wait until you open the link we sent to {{ user.email }}.</p>
          <button mat-stroked-button type="button" [disabled]="busy()" (click)="sendAgain()">Send the link again</button>
          @if (message(); as m) { <p role="status">{{ m }}</p> }
        </div>
      }
    }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class EmailConfirmationNotice {
  protected readonly session = inject(Session);
  protected readonly busy = signal(false);
  protected readonly message = signal<string | null>(null);

  protected async sendAgain(): Promise<void> {
    this.busy.set(true);
    try {
      this.message.set(await this.session.resendConfirmation());
    } catch (error) {
      this.message.set(apiErrorMessage(error));
    } finally {
      this.busy.set(false);
    }
  }
}
