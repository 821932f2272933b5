import { ChangeDetectionStrategy, Component, input, output, signal } from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatFormField, MatHint, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MESSAGE_MAX_CHARS } from '@shared/contracts/message-limits';

/** A box to write a message in; the page sends it and clears it through `sent()`. */
@Component({
  selector: 'app-message-composer',
  imports: [FormsModule, MatFormField, MatLabel, MatHint, MatInput, MatButton],
  template: `
    <form (ngSubmit)="send()">
      <mat-form-field appearance="outline" class="full">
        <mat-label>{{ label() }}</mat-label>
        <textarea matInput name="body" rows="3" [attr.maxlength]="maxChars" [ngModel]="body()" (ngModelChange)="body.set($event)"></textarea>
        <mat-hint align="end">{{ body().length }} of {{ maxChars }}</mat-hint>
      </mat-form-field>
      <button mat-flat-button type="submit" [disabled]="busy() || body().trim() === ''">{{ action() }}</button>
    </form>
  `,
  styles: `.full { width: 100%; }`,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class MessageComposer {
  readonly label = input('Your message');
  readonly action = input('Send');
  readonly busy = input(false);
  readonly write = output<string>();
  protected readonly body = signal('');
  protected readonly maxChars = MESSAGE_MAX_CHARS;

  protected send(): void {
    const text = this.body().trim();
    if (text) this.write.emit(text);
  }

  /** Called by the page once the message is stored. */
  clear(): void {
    this.body.set('');
  }
}
