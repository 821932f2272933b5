import { ChangeDetectionStrategy, Component, effect, inject, input, signal } from '@angular/core';
import { FormBuilder, ReactiveFormsModule, Validators } from '@angular/forms';
import { MatButton } from '@angular/material/button';
import { MatError, MatFormField, MatHint, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { MatRadioButton, MatRadioGroup } from '@angular/material/radio';
import { RouterLink } from '@angular/router';
import { apiErrorMessage } from '../../core/api-error';
import { Session } from '../../core/session';

@Component({
  selector: 'app-sign-up-page',
  imports: [ReactiveFormsModule, RouterLink, MatFormField, MatLabel, MatError, MatHint, MatInput, MatButton, MatRadioGroup, MatRadioButton],
  templateUrl: './sign-up-page.html',
  styleUrl: './account-form.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SignUpPage {
  private readonly session = inject(Session);
  /** Pre-selected role from the link (`?role=grower`). */
  readonly role = input<string>();

  protected readonly form = inject(FormBuilder).nonNullable.group({
    displayName: ['', [Validators.required, Validators.maxLength(100)]],
    email: ['', [Validators.required, Validators.email]],
    password: ['', [Validators.required, Validators.minLength(10)]],
    role: ['buyer' as 'buyer' | 'grower', Validators.required],
  });
  protected readonly error = signal('');
  protected readonly busy = signal(false);
  /** The answer, shown alike whether the address was new or already had an account. */
  protected readonly sent = signal<{ message: string; next: string } | null>(null);

  constructor() {
    effect(() => {
      const role = this.role();
      if (role === 'grower' || role === 'buyer') this.form.controls.role.setValue(role);
    });
  }

  protected async signUp(): Promise<void> {
    if (this.form.invalid) {
      this.form.markAllAsTouched();
      return;
    }
    this.busy.set(true);
    this.error.set('');
    try {
      const input = this.form.getRawValue();
      const answer = await this.session.signUp(input);
      this.sent.set({ message: answer.message, next: input.role === 'grower' ? '/selling' : '/hay' });
    } catch (e) {
      this.error.set(apiErrorMessage(e));
    } finally {
      this.busy.set(false);
    }
  }
}
