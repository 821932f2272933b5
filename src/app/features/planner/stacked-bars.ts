import { formatNumber } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, inject, input, LOCALE_ID } from '@angular/core';

/** One bar: its label and the parts stacked from left to right, in the chart's unit. */
export interface StackedBar {
  readonly label: string;
  readonly parts: readonly number[];
}

const WIDTH = 480;
const LABEL_H = 16;
const BAR_H = 18;
const ROW_H = 44;

/**
 * A small horizontal stacked-bar chart drawn as plain SVG on the server. The parts are told apart by
 * pattern and a key in words, not by colour alone; each bar ends with its total in the reader's locale.
 * The table beside it carries the same figures for screen readers.
 */
@Component({
  selector: 'app-stacked-bars',
  template: `
    <figure class="chart">
      <figcaption>{{ caption() }}</figcaption>
      <ul class="key">
        @for (name of partNames(); track $index) {
          <li><span class="swatch" [attr.data-part]="$index"></span>{{ name }}</li>
        }
      </ul>
      <svg [attr.viewBox]="'0 0 ' + width + ' ' + height()" role="img" [attr.aria-label]="summary()" preserveAspectRatio="xMinYMin meet">
        @for (bar of drawn(); track $index; let i = $index) {
          <g [attr.transform]="'translate(0,' + i * rowH + ')'">
            <text x="0" y="12" class="label">{{ bar.label }}</text>
            @for (p of bar.parts; track $index; let j = $index) {
              <rect [attr.x]="p.x" [attr.y]="labelH" [attr.width]="p.w" [attr.height]="barH" [attr.data-part]="j" />
            }
            <text [attr.x]="bar.end + 6" [attr.y]="labelH + barH - 4" class="total">{{ bar.totalText }}</text>
          </g>
        }
      </svg>
    </figure>
  `,
  styles: `
    :host { display: block; }
    .chart { margin: 12px 0; max-width: 720px; }
    figcaption { font-weight: 600; font-size: var(--bp-text-sm); }
    .key { list-style: none; display: flex; flex-wrap: wrap; gap: 4px 16px; padding: 0; margin: 4px 0 8px; font-size: var(--bp-text-sm); }
    .key li { display: inline-flex; align-items: center; gap: 6px; }
    .swatch { display: inline-block; width: 14px; height: 14px; border: 1px solid var(--bp-ink); }
    svg { width: 100%; height: auto; display: block; overflow: visible; }
    .label { font-size: 13px; fill: var(--bp-ink); }
    .total { font-size: 13px; fill: var(--bp-ink); font-variant-numeric: tabular-nums; }
    rect { stroke: var(--bp-ink); stroke-width: 1; }
    [data-part='0'] { fill: var(--bp-ink); background: var(--bp-ink); }
    [data-part='1'] { fill: var(--bp-straw); background: var(--bp-straw); }
    [data-part='2'] { fill: var(--bp-sorrel); background: var(--bp-sorrel); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class StackedBars {
  private readonly locale = inject(LOCALE_ID);

  readonly caption = input.required<string>();
  readonly partNames = input.required<readonly string[]>();
  readonly bars = input.required<readonly StackedBar[]>();
  /** Unit written after each total, e.g. "lb a day". */
  readonly unit = input.required<string>();
  /** Angular digits info for the totals, e.g. '1.0-0'. */
  readonly digits = input('1.0-1');
  /** Money charts write their totals through this instead of number + unit. */
  readonly formatTotal = input<((value: number) => string) | null>(null);

  protected readonly width = WIDTH;
  protected readonly labelH = LABEL_H;
  protected readonly barH = BAR_H;
  protected readonly rowH = ROW_H;
  protected readonly height = computed(() => Math.max(1, this.bars().length) * ROW_H);

  private readonly text = (value: number) => this.formatTotal()?.(value) ?? `${formatNumber(value, this.locale, this.digits())} ${this.unit()}`;

  protected readonly drawn = computed(() => {
    const bars = this.bars();
    // Room at the right for the total written after the longest bar.
    const span = WIDTH - 130;
    const max = Math.max(...bars.map((b) => b.parts.reduce((s, p) => s + Math.max(0, p), 0)), Number.MIN_VALUE);
    return bars.map((bar) => {
      let x = 0;
      const parts = bar.parts.map((p) => {
        const w = (Math.max(0, p) / max) * span;
        const part = { x, w };
        x += w;
        return part;
      });
      const total = bar.parts.reduce((s, p) => s + p, 0);
      return { label: bar.label, parts, end: x, totalText: this.text(total) };
    });
  });

  protected readonly summary = computed(() => {
    const names = this.partNames();
    return `${this.caption()}: ` + this.bars().map((b) => `${b.label}, ${b.parts.map((p, i) => `${names[i] ?? ''} ${this.text(p)}`).join(' plus ')}`).join('; ');
  });
}
