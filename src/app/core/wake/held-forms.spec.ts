import { HELD_SUBMIT, LIVE_FORM, SAVE_SEARCH_FORM_ID } from '../../features/catalogue/saved-searches/held-submit';
import { FILTER_FORM_ID, holdServerFormSubmits } from './held-forms';

/** Submits a form with this id the way a press of Enter or of its button does; true when the browser would go on to send it. */
function submit(id: string, live = false): { sent: boolean; form: HTMLFormElement } {
  const form = document.body.appendChild(document.createElement('form'));
  form.id = id;
  if (live) form.setAttribute(LIVE_FORM, '');
  const sent = form.dispatchEvent(new Event('submit', { bubbles: true, cancelable: true }));
  form.remove();
  return { sent, form };
}

describe('holdServerFormSubmits', () => {
  let stop: () => void;
  beforeEach(() => (stop = holdServerFormSubmits(document)));
  afterEach(() => stop());

  it('stops the filters from reloading the page', () => {
    expect(submit(FILTER_FORM_ID).sent).toBe(false);
  });

  it('holds the saved-search form until its panel is live, marking it for the panel to send', () => {
    const held = submit(SAVE_SEARCH_FORM_ID);
    expect(held.sent).toBe(false);
    expect(held.form.hasAttribute(HELD_SUBMIT)).toBe(true);
    const live = submit(SAVE_SEARCH_FORM_ID, true);
    expect(live.sent).toBe(true);
    expect(live.form.hasAttribute(HELD_SUBMIT)).toBe(false);
  });

  it('leaves every other form alone, and all of them once stopped', () => {
    expect(submit('sign-in').sent).toBe(true);
    stop();
    expect(submit(FILTER_FORM_ID).sent).toBe(true);
  });
});
