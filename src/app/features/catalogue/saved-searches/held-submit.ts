/**
 * The saved-search form sits in the catalogue's layout, which stays as the server sent it until touched. Until
 * the form's component is live (it marks its form with LIVE_FORM), core/wake/held-forms.ts stops the form's submit,
 * which would otherwise go natively and reload the page without its filters, and marks it with HELD_SUBMIT; the
 * component replays it when it wakes.
 */
export const LIVE_FORM = 'data-live';
export const HELD_SUBMIT = 'data-held-submit';
export const SAVE_SEARCH_FORM_ID = 'save-search';
