import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { IconName } from '../../core/icon-names';
import { ICON_PATHS } from './icon-paths';

/**
 * A Material Symbols icon drawn as inline SVG in the text colour: no icon font to download and no second layout
 * of the page when one arrives. 24 px by default; `inline` sizes it to the surrounding text. Decorative: hidden
 * from screen readers, so the control or text beside it carries the meaning. The host carries Material's
 * `mat-icon` class, so buttons and menu items space it as they would their own icons.
 */
@Component({
  selector: 'app-icon',
  template: `<svg viewBox="0 -960 960 960" focusable="false"><path [attr.d]="path()" /></svg>`,
  host: { class: 'mat-icon', '[class.inline]': 'inline()', 'aria-hidden': 'true' },
  styles: `
    :host { display: inline-block; flex: none; width: 24px; height: 24px; line-height: 0; vertical-align: middle; fill: currentColor; }
    :host(.inline) { width: 1.15em; height: 1.15em; vertical-align: -0.2em; }
    svg { width: 100%; height: 100%; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class Icon {
  readonly name = input.required<IconName>();
  /** Sized to the surrounding text instead of 24 px. */
  readonly inline = input(false, { transform: (v: boolean | '') => v !== false });
  protected readonly path = computed(() => ICON_PATHS[this.name()]);
}
