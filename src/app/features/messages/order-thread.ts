import { afterNextRender, ChangeDetectionStrategy, Component, computed, inject, input, signal, viewChild } from '@angular/core';
import { firstValueFrom } from 'rxjs';
import type { OrderThread as OrderThreadView } from '@shared/contracts/messages';
import { apiErrorMessage } from '../../core/api-error';
import { Session } from '../../core/session';
import { MessageComposer } from './message-composer';
import { MessageList } from './message-list';
import { MessagesApi } from './messages-api';

/** On an order's page: the buyer and the grower write to each other about this order; an admin reads along. */
@Component({
  selector: 'app-order-thread',
  imports: [MessageList, MessageComposer],
  template: `
    <section id="messages" class="thread" aria-labelledby="order-messages-title">
      <h2 id="order-messages-title">Messages about this order</h2>
      @if (view(); as v) {
        <p class="hint">{{ hint() }}</p>
        @if (v.thread; as t) { <app-message-list [messages]="t.messages" /> }
        @if (error(); as e) { <div class="bp-error-box" role="alert">{{ e }}</div> }
        @if (v.mayWrite) {
          <app-message-composer [label]="otherLabel()" action="Send" [busy]="busy()" (write)="send($event)" />
        } @else if (v.whyNot) {
          <p class="hint">{{ v.whyNot }}</p>
        }
      } @else if (error(); as e) {
        <div class="bp-error-box" role="alert">{{ e }}</div>
      } @else {
        <p class="hint">Loading the messages…</p>
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
export class OrderThread {
  private readonly api = inject(MessagesApi);
  private readonly session = inject(Session);
  readonly orderId = input.required<number>();

  private readonly composer = viewChild(MessageComposer);
  protected readonly view = signal<OrderThreadView | null>(null);
  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);
  protected readonly otherLabel = computed(() => (this.session.role() === 'grower' ? 'Write to the buyer' : 'Write to the grower'));
  protected readonly hint = computed(() =>
    this.session.role() === 'grower'
      ? 'Arrange the pickup or delivery with the buyer here: gate codes, trailer size, the time of day. The buyer gets an e-mail.'
      : this.session.role() === 'admin'
        ? 'What the buyer and the grower wrote to each other about this order.'
        : 'Ask the grower about this order here: the time of day, trailer size, how to find the barn. The grower gets an e-mail.',
  );

  constructor() {
    afterNextRender(() => void this.load());
  }

  protected async send(body: string): Promise<void> {
    this.busy.set(true);
    this.error.set(null);
    try {
      this.view.set(await firstValueFrom(this.api.writeAboutOrder(this.orderId(), body)));
      this.composer()?.clear();
    } catch (e) {
      this.error.set(apiErrorMessage(e));
    } finally {
      this.busy.set(false);
    }
  }

  private async load(): Promise<void> {
    try {
      this.view.set(await firstValueFrom(this.api.aboutOrder(this.orderId())));
    } catch (e) {
      this.error.set(apiErrorMessage(e));
    }
  }
}
