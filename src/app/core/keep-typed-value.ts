import { AfterViewInit, Directive, ElementRef, PLATFORM_ID, inject } from '@angular/core';
import { isPlatformBrowser } from '@angular/common';

/**
 * Keeps what a person typed, picked or ticked in a server-rendered field before its form woke up.
 *
 * A field inside a block that hydrates on interaction is live only after the first touch; until then
 * the browser types into the server's `<input>` (or changes its `<select>`, ticks its checkbox). When the
 * block hydrates, the form writes its own value into the field (usually empty), which would wipe that.
 * This follows the field from the moment hydration finds it until the form is set up and, if the form then
 * shows something else, puts the person's entry back and announces it with the event the form's own value
 * accessor listens to (`input`, or `change` for lists and boxes), so it is parsed as if entered now.
 */
@Directive({ selector: 'input[bpKeepTypedValue], select[bpKeepTypedValue]' })
export class KeepTypedValue implements AfterViewInit {
  private readonly field = inject<ElementRef<HTMLInputElement | HTMLSelectElement>>(ElementRef).nativeElement;
  private readonly isBox = this.field.tagName === 'INPUT' && /^(checkbox|radio)$/i.test(this.field.getAttribute('type') ?? '');
  private readonly eventName = this.isBox || this.field.tagName === 'SELECT' ? 'change' : 'input';
  /** The field's latest entry while hydration sets the form up; null when the field is new (client-rendered). */
  private entered = isPlatformBrowser(inject(PLATFORM_ID)) && this.field.isConnected ? this.read() : null;
  private readonly follow = (): void => {
    this.entered = this.read();
  };

  constructor() {
    if (this.entered !== null) this.field.addEventListener(this.eventName, this.follow);
  }

  ngAfterViewInit(): void {
    if (this.entered === null) return;
    this.field.removeEventListener(this.eventName, this.follow);
    if (this.read() === this.entered) return;
    if (this.isBox) (this.field as HTMLInputElement).checked = this.entered === 'true';
    else this.field.value = this.entered;
    this.field.dispatchEvent(new Event(this.eventName, { bubbles: true }));
  }

  private read(): string {
    return this.isBox ? String((this.field as HTMLInputElement).checked) : this.field.value;
  }
}
