import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { afgcBandTable } from '@shared/forage/grades';

const W = 340;
const X0 = 10;
const X1 = W - 10;
const LO = 50;

/**
 * RFV and RFQ on one index scale (both read 100 = full-bloom alfalfa), with the AFGC grade limits ruled across.
 * Plain SVG; the figures are also given in words.
 */
@Component({
  selector: 'app-feed-value-scale',
  imports: [DecimalPipe],
  template: `
    <figure>
      <figcaption><strong>Feed value</strong> <span class="muted">RFV and RFQ, index (100 = full-bloom alfalfa)</span></figcaption>
      <svg [attr.viewBox]="'0 0 ' + w + ' 84'" role="img" [attr.aria-label]="summary()">
        @for (b of bands(); track b.grade) {
          <rect [attr.x]="b.x" y="30" [attr.width]="b.width" height="16" [class]="'seg s' + $index" />
          <text [attr.x]="b.x + b.width / 2" y="42" class="lbl mid inv">{{ b.short }}</text>
        }
        @for (t of ticks(); track t) {
          <line [attr.x1]="x(t)" [attr.x2]="x(t)" y1="46" y2="50" class="tick" />
          <text [attr.x]="x(t)" y="60" class="lbl mid">{{ t }}</text>
        }
        <g [attr.transform]="'translate(' + x(rfv()) + ',0)'">
          <path d="M-6 14 L6 14 L0 26 Z" class="rfv" />
          <text y="10" class="lbl mid strong">RFV {{ rfv() | number: '1.0-0' }}</text>
        </g>
        @if (rfq(); as q) {
          <g [attr.transform]="'translate(' + x(q) + ',0)'">
            <path d="M-6 76 L6 76 L0 64 Z" class="rfq" />
            <text y="84" class="lbl mid strong" dy="-0">RFQ {{ q | number: '1.0-0' }}</text>
          </g>
        }
      </svg>
      <p class="note">Bands: AFGC legume grades by RFV (Prime above 151 down to Grade 5 below 75).</p>
    </figure>
  `,
  styles: `
    figure { margin: 0; }
    figcaption { font-size: var(--bp-text-sm); }
    .muted, .note { color: var(--bp-muted); }
    .note { font-size: var(--bp-text-xs); margin: 2px 0 0; }
    svg { width: 100%; max-width: 420px; height: auto; display: block; overflow: visible; }
    .s0 { fill: var(--bp-grade-1); } .s1 { fill: var(--bp-grade-2); } .s2 { fill: var(--bp-grade-3); }
    .s3 { fill: var(--bp-grade-4); } .s4, .s5 { fill: var(--bp-grade-5); }
    .seg { stroke: var(--bp-tag); stroke-width: 1; }
    .tick { stroke: var(--bp-ink); stroke-width: 1; }
    .lbl { font-size: 10px; fill: var(--bp-ink); }
    .inv { fill: #fff; font-weight: 700; }
    .s3 + .inv, .s4 + .inv, .s5 + .inv { fill: var(--bp-ink); }
    .mid { text-anchor: middle; }
    .strong { font-weight: 700; }
    .rfv { fill: var(--bp-ink); }
    .rfq { fill: var(--bp-sorrel); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class FeedValueScale {
  readonly rfv = input.required<number>();
  readonly rfq = input<number | null>(null);

  protected readonly w = W;
  private readonly hi = computed(() => Math.max(250, Math.ceil((Math.max(this.rfv(), this.rfq() ?? 0) + 10) / 50) * 50));
  protected readonly ticks = computed(() => Array.from({ length: (this.hi() - LO) / 50 + 1 }, (_, i) => LO + i * 50));
  /** AFGC bands from the lowest grade on the left to Prime on the right. */
  protected readonly bands = computed(() => {
    const table = afgcBandTable();
    return table.map((b, i) => {
      const lo = b.limit ?? LO;
      const hi = i === 0 ? this.hi() : table[i - 1]!.limit!;
      return { grade: b.grade, short: b.grade.replace('Grade ', 'G'), x: this.x(lo), width: this.x(hi) - this.x(lo) };
    });
  });
  protected readonly summary = computed(
    () => `RFV ${this.rfv().toFixed(0)}` + (this.rfq() !== null ? `, RFQ ${this.rfq()!.toFixed(0)}` : ', RFQ not reported') + ' on a scale where 100 is full-bloom alfalfa; AFGC Prime starts above 151.',
  );

  protected x(v: number): number {
    return X0 + ((Math.min(Math.max(v, LO), this.hi()) - LO) / (this.hi() - LO)) * (X1 - X0);
  }
}
