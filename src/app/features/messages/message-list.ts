import { DatePipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, input } from '@angular/core';
import type { MessageView } from '@shared/contracts/messages';

/** The messages of one conversation, oldest first, the reader's own on the right. */
@Component({
  selector: 'app-message-list',
  imports: [DatePipe],
  template: `
    <ol class="list" aria-label="Messages">
      @for (m of messages(); track m.id) {
        <li [class.mine]="m.mine">
          <p class="who"><strong>{{ m.mine ? 'You' : m.senderName }}</strong> · <time [attr.datetime]="m.createdAt">{{ m.createdAt | date: 'medium' }}</time></p>
          <p class="body">{{ m.body }}</p>
        </li>
      } @empty {
        <li class="none">No messages yet.</li>
      }
    </ol>
  `,
  styles: `
    .list { list-style: none; margin: 0 0 12px; padding: 0; display: flex; flex-direction: column; gap: 8px; }
    li { max-width: 85%; padding: 8px 12px; background: var(--bp-tag); border: 1px solid var(--bp-rule); border-left: 4px solid var(--bp-ink); }
    li.mine { align-self: flex-end; border-left-color: var(--bp-sorrel); background: var(--mat-sys-surface-container-low); }
    li.none { border: 0; background: none; color: var(--bp-muted); }
    .who { margin: 0 0 2px; font-size: var(--bp-text-xs); color: var(--bp-muted); }
    .body { margin: 0; white-space: pre-wrap; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MessageList {
  readonly messages = input.required<MessageView[]>();
}
