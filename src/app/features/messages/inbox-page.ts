import { DatePipe } from '@angular/common';
import { afterNextRender, ChangeDetectionStrategy, Component, effect, inject, input, signal, viewChild } from '@angular/core';
import { RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import type { ThreadDetail, ThreadView } from '@shared/contracts/messages';
import { apiErrorMessage } from '../../core/api-error';
import { MessageComposer } from './message-composer';
import { MessageList } from './message-list';
import { MessagesApi } from './messages-api';

/** Everyone's conversations about lots and orders: the list, and the open one with a reply box. */
@Component({
  selector: 'app-inbox-page',
  imports: [DatePipe, RouterLink, MessageList, MessageComposer],
  template: `
    <div class="bp-page layout">
      <section class="list" aria-labelledby="inbox-title">
        <h1 id="inbox-title">Messages</h1>
        @if (threads(); as list) {
          <ul aria-label="Conversations">
            @for (t of list; track t.id) {
              <li [class.open]="open()?.id === t.id">
                <a [routerLink]="['/messages', t.id]">
                  <span class="top"><strong>{{ t.withName }}</strong>@if (t.unread > 0) { <span class="unread">{{ t.unread }} new</span> }</span>
                  <span class="lot">{{ t.subject }}</span>
                  <span class="last">{{ t.lastMessage }}</span>
                  <time [attr.datetime]="t.lastMessageAt">{{ t.lastMessageAt | date: 'mediumDate' }}</time>
                </a>
              </li>
            } @empty {
              <li class="none">No conversations yet. Buyers write from a lot's page ("Ask the grower"); buyer and grower write about an order on its page.</li>
            }
          </ul>
        }
      </section>
      <section class="thread" aria-live="polite">
        @if (error(); as e) { <div class="bp-error-box" role="alert">{{ e }}</div> }
        @if (open(); as t) {
          <h2>{{ t.withName }} · <a [routerLink]="t.orderId !== null ? ['/orders', t.orderId] : ['/hay', t.lotId]">{{ t.subject }}</a></h2>
          <app-message-list [messages]="t.messages" />
          <app-message-composer label="Your answer" action="Send" [busy]="busy()" (write)="reply(t.id, $event)" />
        } @else if (threads()?.length) {
          <p class="muted">Choose a conversation.</p>
        }
      </section>
    </div>
  `,
  styles: `
    .layout { display: grid; grid-template-columns: minmax(0, 320px) minmax(0, 1fr); gap: 24px; }
    @media (max-width: 800px) { .layout { grid-template-columns: minmax(0, 1fr); } }
    ul { list-style: none; padding: 0; margin: 0; border-top: 1.5px solid var(--bp-ink); }
    li a { display: grid; gap: 2px; padding: 8px; color: var(--bp-ink); text-decoration: none; border-bottom: 1px solid var(--bp-rule); }
    li.open a { background: var(--bp-tag); border-left: 4px solid var(--bp-sorrel); }
    .top { display: flex; justify-content: space-between; gap: 8px; }
    .unread { font-size: var(--bp-text-xs); font-weight: 700; color: var(--bp-tag); background: var(--bp-sorrel); padding: 0 6px; border-radius: 2px; }
    .lot, time { font-size: var(--bp-text-xs); color: var(--bp-muted); }
    .last { overflow: hidden; text-overflow: ellipsis; white-space: nowrap; }
    .none, .muted { color: var(--bp-muted); }
    h2 { font-size: var(--bp-text-lg); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class InboxPage {
  private readonly api = inject(MessagesApi);
  /** Route parameter `:id` of the open conversation. */
  readonly id = input<string>();

  private readonly composer = viewChild(MessageComposer);
  protected readonly threads = signal<ThreadView[] | null>(null);
  protected readonly open = signal<ThreadDetail | null>(null);
  protected readonly busy = signal(false);
  protected readonly error = signal<string | null>(null);
  private readonly ready = signal(false);

  constructor() {
    afterNextRender(() => this.ready.set(true));
    effect(() => {
      if (!this.ready()) return;
      void this.load(Number(this.id()) || null);
    });
  }

  protected async reply(id: number, body: string): Promise<void> {
    this.busy.set(true);
    this.error.set(null);
    try {
      this.open.set(await firstValueFrom(this.api.reply(id, body)));
      this.composer()?.clear();
      this.threads.set(await firstValueFrom(this.api.inbox()));
    } catch (e) {
      this.error.set(apiErrorMessage(e));
    } finally {
      this.busy.set(false);
    }
  }

  private async load(id: number | null): Promise<void> {
    try {
      // Opening a thread marks it read, so the list is fetched after it.
      this.open.set(id ? await firstValueFrom(this.api.thread(id)) : null);
      this.threads.set(await firstValueFrom(this.api.inbox()));
    } catch (e) {
      this.error.set(apiErrorMessage(e));
    }
  }
}
