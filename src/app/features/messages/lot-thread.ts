import { afterNextRender, ChangeDetectionStrategy, Component, computed, inject, input, signal, viewChild } from '@angular/core';
import { RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import type { ThreadDetail } from '@shared/contracts/messages';
import { apiErrorMessage } from '../../core/api-error';
import { Session } from '../../core/session';
import { MessageComposer } from './message-composer';
import { MessageList } from './message-list';
import { MessagesApi } from './messages-api';

/** On the lot page: a signed-in buyer asks the grower about this lot and reads the answers. */
@Component({
  selector: 'app-lot-thread',
  imports: [RouterLink, MessageList, MessageComposer],
  template: `
    <section class="thread" aria-labelledby="ask-title">
      <h2 id="ask-title">Ask the grower</h2>
      @if (role() === 'buyer') {
        <p class="hint">How was it cut, was it rained on, can a semi reach the barn? The grower gets an e-mail and answers here.</p>
        @if (thread(); as t) { <app-message-list [messages]="t.messages" /> }
        @if (error(); as e) { <div class="bp-error-box" role="alert">{{ e }}</div> }
        <app-message-composer [label]="thread() ? 'Write again' : 'Your question'" action="Send to the grower" [busy]="busy()" (write)="send($event)" />
        @if (sent()) { <p role="status" class="hint">Sent. <a routerLink="/messages">All your conversations</a></p> }
      } @else if (role() === null) {
        <p class="hint"><a routerLink="/sign-in" [queryParams]="{ returnTo: '/hay/' + lotId() }">Sign in as a buyer</a> to ask the grower about this lot.</p>
      } @else {
        <p class="hint">Buyers can ask the grower about this lot here.</p>
      }
    </section>
  `,
  styles: `
    .thread { margin: 24px 0; padding: 16px; background: var(--bp-tag); border: 1.5px solid var(--bp-ink); }
    h2 { margin: 0 0 4px; font-size: var(--bp-text-lg); }
    .hint { color: var(--bp-muted); font-size: var(--bp-text-sm); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class LotThread {
  private readonly api = inject(MessagesApi);
  private readonly session = inject(Session);
  readonly lotId = input.required<number>();

  private readonly composer = viewChild(MessageComposer);
  protected readonly role = computed(() => this.session.role());
  protected readonly thread = signal<ThreadDetail | null>(null);
  protected readonly busy = signal(false);
  protected readonly sent = signal(false);
  protected readonly error = signal<string | null>(null);

  constructor() {
    afterNextRender(() => void this.load());
  }

  protected async send(body: string): Promise<void> {
    this.busy.set(true);
    this.error.set(null);
    try {
      const t = this.thread();
      this.thread.set(await firstValueFrom(t ? this.api.reply(t.id, body) : this.api.writeAboutLot(this.lotId(), body)));
      this.composer()?.clear();
      this.sent.set(true);
    } catch (e) {
      this.error.set(apiErrorMessage(e));
    } finally {
      this.busy.set(false);
    }
  }

  private async load(): Promise<void> {
    if (this.role() !== 'buyer') return;
    try {
      this.thread.set(await firstValueFrom(this.api.aboutLot(this.lotId())));
    } catch (e) {
      this.error.set(apiErrorMessage(e));
    }
  }
}
