import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { NSC_STRICT_LIMIT_PCT, NSC_UPPER_LIMIT_PCT } from '@shared/forage/nsc';

const W = 340;
const X0 = 10;
const X1 = W - 10;

/** NSC (% of DM) on a ruler with the 10–12% band advised for horses prone to laminitis marked. Plain SVG. */
@Component({
  selector: 'app-nsc-gauge',
  imports: [DecimalPipe],
  template: `
    <figure>
      <figcaption><strong>Sugar + starch (NSC)</strong> <span class="muted">% of dry matter</span></figcaption>
      <svg [attr.viewBox]="'0 0 ' + w + ' 64'" role="img" [attr.aria-label]="summary()">
        <rect [attr.x]="x0" y="22" [attr.width]="x(strict) - x0" height="14" class="under" />
        <rect [attr.x]="x(strict)" y="18" [attr.width]="x(upper) - x(strict)" height="22" class="band" />
        <rect [attr.x]="x(upper)" y="22" [attr.width]="x1 - x(upper)" height="14" class="over" />
        <text [attr.x]="(x(strict) + x(upper)) / 2" y="13" class="lbl mid">advised limit {{ strict }}–{{ upper }}%</text>
        @for (t of ticks(); track t) {
          <line [attr.x1]="x(t)" [attr.x2]="x(t)" y1="36" y2="41" class="tick" />
          <text [attr.x]="x(t)" y="52" class="lbl mid">{{ t }}</text>
        }
        <g [attr.transform]="'translate(' + x(value()) + ',0)'">
          <path d="M-6 10 L6 10 L0 20 Z" class="pointer" />
          <line x1="0" x2="0" y1="20" y2="40" class="needle" />
        </g>
      </svg>
      <p class="reading"><strong class="bp-num">{{ value() | number: '1.1-1' }}%</strong> — {{ verdict() }}</p>
    </figure>
  `,
  styles: `
    figure { margin: 0; }
    figcaption { font-size: var(--bp-text-sm); }
    .muted { color: var(--bp-muted); }
    svg { width: 100%; max-width: 420px; height: auto; display: block; }
    .under { fill: #dfe6d6; }
    .band { fill: var(--bp-straw); stroke: var(--bp-warn); stroke-width: 1; }
    .over { fill: #efd6cc; }
    .tick, .needle { stroke: var(--bp-ink); stroke-width: 1.5; }
    .pointer { fill: var(--bp-ink); }
    .lbl { font-size: 10px; fill: var(--bp-ink); }
    .mid { text-anchor: middle; }
    .reading { margin: 2px 0 0; font-size: var(--bp-text-sm); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NscGauge {
  readonly value = input.required<number>();

  protected readonly w = W;
  protected readonly x0 = X0;
  protected readonly x1 = X1;
  protected readonly strict = NSC_STRICT_LIMIT_PCT;
  protected readonly upper = NSC_UPPER_LIMIT_PCT;
  private readonly max = computed(() => Math.max(25, Math.ceil((this.value() + 3) / 5) * 5));
  protected readonly ticks = computed(() => Array.from({ length: this.max() / 5 + 1 }, (_, i) => i * 5));
  protected readonly verdict = computed(() => {
    const v = this.value();
    if (v < this.strict) return `under the ${this.strict}% strict limit often advised for horses prone to laminitis`;
    if (v < this.upper) return `inside the ${this.strict}–${this.upper}% band: above the strict limit, ask your veterinarian`;
    return `above the ${this.upper}% upper limit often advised; soaking or other hay may be advised by your veterinarian`;
  });
  protected readonly summary = computed(() => `NSC ${this.value().toFixed(1)}% of dry matter; ${this.verdict()}.`);

  protected x(v: number): number {
    return X0 + (Math.min(Math.max(v, 0), this.max()) / this.max()) * (X1 - X0);
  }
}
