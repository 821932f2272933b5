import { AfterViewInit, Directive, ElementRef, PLATFORM_ID, inject } from '@angular/core';
import { isPlatformBrowser } from '@angular/common';

/**
 * Keeps what a person typed into a server-rendered field before its form woke up.
 *
 * A field inside a block that hydrates on interaction is live only after the first touch; until then
 * the browser types into the server's `<input>`. When the block hydrates, the form writes its own value
 * into the field (usually empty), which would wipe those keystrokes. This follows the field's text from
 * the moment hydration finds it until the form is set up and, if the form then shows something else,
 * puts the typed text back and announces it with an `input` event, so the form's own value accessor
 * parses it (numbers as numbers) as if typed now.
 */
@Directive({ selector: 'input[bpKeepTypedValue]' })
export class KeepTypedValue implements AfterViewInit {
  private readonly input = inject<ElementRef<HTMLInputElement>>(ElementRef).nativeElement;
  /** The field's latest text while hydration sets the form up; null when the field is new (client-rendered). */
  private typed = isPlatformBrowser(inject(PLATFORM_ID)) && this.input.isConnected ? this.input.value : null;
  private readonly follow = (): void => {
    this.typed = this.input.value;
  };

  constructor() {
    if (this.typed !== null) this.input.addEventListener('input', this.follow);
  }

  ngAfterViewInit(): void {
    if (this.typed === null) return;
    this.input.removeEventListener('input', this.follow);
    if (this.input.value === this.typed) return;
    this.input.value = this.typed;
    this.input.dispatchEvent(new Event('input', { bubbles: true }));
  }
}
