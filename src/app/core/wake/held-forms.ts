import { HELD_SUBMIT, LIVE_FORM, SAVE_SEARCH_FORM_ID } from '../../features/catalogue/saved-searches/held-submit';

/** The id of the catalogue's filter form (lot-search-view.html). */
export const FILTER_FORM_ID = 'lot-filters';

/**
 * Until the catalogue's forms are live, a press of Enter or of a form's button would submit the server's form
 * natively and reload the page. The filters apply as they change once the page wakes, so their submit is
 * simply stopped. The saved-search form's submit is stopped and marked with HELD_SUBMIT, and its panel
 * replays it once live (it marks its form with LIVE_FORM). Plain DOM, so it can run before the app starts.
 * Returns the function that stops holding.
 */
export function holdServerFormSubmits(document: Document): () => void {
  const hold = (event: Event) => {
    const form = event.target as Element | null;
    if (form?.id === FILTER_FORM_ID) event.preventDefault();
    else if (form?.id === SAVE_SEARCH_FORM_ID && !form.hasAttribute(LIVE_FORM)) {
      event.preventDefault();
      form.setAttribute(HELD_SUBMIT, '');
    }
  };
  document.addEventListener('submit', hold, true);
  return () => document.removeEventListener('submit', hold, true);
}
