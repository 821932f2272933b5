import { afterNextRender, afterRenderEffect, ChangeDetectionStrategy, Component, computed, ElementRef, inject, input, signal, untracked, viewChild } from '@angular/core';
import { FormsModule } from '@angular/forms';
import { MatButton, MatIconButton } from '@angular/material/button';
import { MatFormField, MatLabel } from '@angular/material/form-field';
import { MatInput } from '@angular/material/input';
import { RouterLink } from '@angular/router';
import { firstValueFrom } from 'rxjs';
import { BALE_TYPE_LABELS, FORAGE_TYPE_LABELS } from '@shared/contracts/labels';
import type { SavedSearchView } from '@shared/contracts/saved-searches';
import { describeQuery, hasAnyFilter } from '../lot-search/search-query';
import { apiErrorMessage } from '../../../core/api-error';
import { Session } from '../../../core/session';
import { EmailConfirmationNotice } from '../../account/email-confirmation-notice';
import { SavedSearchesApi } from './saved-searches-api';
import { HELD_SUBMIT, LIVE_FORM, SAVE_SEARCH_FORM_ID } from './held-submit';
import { Icon } from '../../../shared/ui/icon';

/** Save the catalogue query in the URL, with an e-mail when a newly approved lot matches; list and delete saved ones. */
@Component({
  selector: 'app-saved-searches-panel',
  imports: [FormsModule, RouterLink, EmailConfirmationNotice, MatButton, MatIconButton, Icon, MatFormField, MatLabel, MatInput],
  templateUrl: './saved-searches-panel.html',
  styleUrl: './saved-searches-panel.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class SavedSearchesPanel {
  private readonly api = inject(SavedSearchesApi);
  protected readonly session = inject(Session);

  /** The catalogue query currently in the URL. */
  readonly query = input.required<Record<string, string>>();

  protected readonly saved = signal<SavedSearchView[]>([]);
  protected readonly formId = SAVE_SEARCH_FORM_ID;
  private readonly saveForm = viewChild<ElementRef<HTMLFormElement>>('saveForm');
  private readonly nameField = viewChild<ElementRef<HTMLInputElement>>('nameField');
  protected readonly message = signal<string | null>(null);
  protected readonly busy = signal(false);
  protected readonly isBuyer = computed(() => this.session.role() === 'buyer');
  /** An empty search would alert on every lot: saving waits for a filter. */
  protected readonly canSave = computed(() => hasAnyFilter(this.query()));
  protected readonly returnTo = computed(() => {
    const search = new URLSearchParams(this.query()).toString();
    return search ? `/hay?${search}` : '/hay';
  });

  constructor() {
    // Whenever the form is on the page and live: a press of "Save and alert me" held while the catalogue slept
    // (lot-search-page.ts) is replayed.
    afterRenderEffect(() => {
      const form = this.saveForm()?.nativeElement;
      if (!form || form.hasAttribute(LIVE_FORM)) return;
      form.setAttribute(LIVE_FORM, '');
      if (form.hasAttribute(HELD_SUBMIT)) {
        form.removeAttribute(HELD_SUBMIT);
        untracked(() => void this.saveSearch());
      }
    });
    afterNextRender(() => void this.load());
  }

  protected describe(query: Record<string, string>): string {
    return describeQuery(query, { ...FORAGE_TYPE_LABELS, ...BALE_TYPE_LABELS });
  }

  protected async saveSearch(): Promise<void> {
    if (!this.canSave()) return;
    const field = this.nameField()?.nativeElement;
    const name = field?.value.trim() || 'My hay search';
    this.busy.set(true);
    try {
      const created = await firstValueFrom(this.api.save({ name, query: this.query(), alerts: true }));
      this.saved.update((list) => [created, ...list]);
      if (field) field.value = '';
      this.message.set(`Saved “${created.name}”. We'll e-mail you when a newly approved lot matches.`);
    } catch (error) {
      this.message.set(apiErrorMessage(error));
    } finally {
      this.busy.set(false);
    }
  }

  protected async deleteSearch(search: SavedSearchView): Promise<void> {
    try {
      await firstValueFrom(this.api.remove(search.id));
      this.saved.update((list) => list.filter((s) => s.id !== search.id));
      this.message.set(`Deleted “${search.name}”.`);
    } catch (error) {
      this.message.set(apiErrorMessage(error));
    }
  }

  private async load(): Promise<void> {
    if (!this.isBuyer()) return;
    try {
      this.saved.set(await firstValueFrom(this.api.list()));
    } catch (error) {
      this.message.set(apiErrorMessage(error));
    }
  }
}
