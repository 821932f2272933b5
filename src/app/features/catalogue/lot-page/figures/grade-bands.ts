import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { usdaBandTables, type GradeBandTable } from '@shared/forage/grades';
import { tdnFromAdf } from '@shared/forage/tdn';
import type { ForageClass } from '@shared/contracts/enums';

const W = 340;
const X0 = 6;
const X1 = W - 6;

const NAMES: Record<string, { label: string; unit: string }> = {
  adf: { label: 'ADF', unit: '%' },
  ndf: { label: 'NDF', unit: '%' },
  rfv: { label: 'RFV', unit: '' },
  tdn: { label: 'TDN (ADF equation)', unit: '%' },
  crudeProtein: { label: 'Crude protein', unit: '%' },
};

export interface GradedValues {
  adfPct: number;
  ndfPct: number;
  rfv: number;
  crudeProteinPct: number;
}

/**
 * The lot's analysis against the USDA grade bands, one row per graded measure. Bands are drawn in grade order
 * (lowest left, best right, whichever way the measure runs), labelled with their limits, the lot's band outlined.
 */
@Component({
  selector: 'app-grade-bands',
  imports: [DecimalPipe],
  template: `
    <figure>
      <figcaption><strong>Against the USDA grade bands</strong> <span class="muted">dry-matter basis; better to the right</span></figcaption>
      @for (row of rows(); track row.criterion) {
        <div class="row">
          <p class="name">{{ row.label }} <strong class="bp-num">{{ row.value | number: '1.0-1' }}{{ row.unit }}</strong> → {{ row.grade }}</p>
          <svg [attr.viewBox]="'0 0 ' + w + ' 34'" role="img" [attr.aria-label]="row.summary">
            @for (seg of row.segments; track seg.grade) {
              <rect [attr.x]="seg.x" y="2" [attr.width]="seg.width" height="16" [class]="'seg r' + seg.rank" [class.here]="seg.grade === row.grade" />
              <text [attr.x]="seg.x + seg.width / 2" y="14" class="lbl mid" [class.inv]="seg.rank <= 3">{{ seg.grade }}</text>
              @if (seg.edge !== null) { <text [attr.x]="seg.x + seg.width" y="30" class="lbl mid">{{ seg.edge }}</text> }
            }
            <line [attr.x1]="row.marker" [attr.x2]="row.marker" y1="0" y2="22" class="needle" />
          </svg>
        </div>
      }
    </figure>
  `,
  styles: `
    figure { margin: 0; }
    figcaption { font-size: var(--bp-text-sm); margin-bottom: 4px; }
    .muted { color: var(--bp-muted); }
    .row { margin-bottom: 4px; }
    .name { margin: 0; font-size: var(--bp-text-sm); }
    svg { width: 100%; max-width: 420px; height: auto; display: block; overflow: visible; }
    .seg { stroke: var(--bp-tag); stroke-width: 1; }
    .seg.here { stroke: var(--bp-sorrel); stroke-width: 3; }
    .r1 { fill: var(--bp-grade-1); } .r2 { fill: var(--bp-grade-2); } .r3 { fill: var(--bp-grade-3); }
    .r4 { fill: var(--bp-grade-4); } .r5 { fill: var(--bp-grade-5); }
    .lbl { font-size: 9px; fill: var(--bp-ink); }
    .inv { fill: #fff; font-weight: 700; }
    .mid { text-anchor: middle; }
    .needle { stroke: var(--bp-sorrel); stroke-width: 3; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class GradeBands {
  readonly forageClass = input.required<ForageClass>();
  readonly values = input.required<GradedValues>();
  /** The grade each measure alone gives, as the engine graded it. */
  readonly criteria = input.required<{ criterion: string; name: string }[]>();

  protected readonly w = W;

  protected readonly rows = computed(() => {
    const v = this.values();
    const value: Record<string, number> = { adf: v.adfPct, ndf: v.ndfPct, rfv: v.rfv, tdn: tdnFromAdf(v.adfPct, 'western'), crudeProtein: v.crudeProteinPct };
    const graded = new Map(this.criteria().map((c) => [c.criterion, c.name]));
    return usdaBandTables(this.forageClass()).map((t) => this.row(t, value[t.criterion]!, graded.get(t.criterion) ?? ''));
  });

  private row(table: GradeBandTable, value: number, grade: string) {
    const n = table.bands.length;
    const width = (X1 - X0) / n;
    // Lowest grade on the left: reverse the best-first table.
    const ordered = [...table.bands].reverse();
    const segments = ordered.map((b, i) => ({
      grade: b.grade,
      rank: n - i,
      x: X0 + i * width,
      width,
      // The limit printed at a band's right edge is the one the next (better) band starts at.
      edge: i < n - 1 ? ordered[i + 1]!.limit : null,
    }));
    // Place the value inside its band, by where it falls between the band's limits (open ends take a band's width).
    const idx = Math.max(0, segments.findIndex((s) => s.grade === grade));
    const from = idx > 0 ? segments[idx - 1]!.edge : null;
    const to = segments[idx]!.edge;
    let frac = 0.5;
    if (from !== null && to !== null && from !== to) frac = (value - from) / (to - from);
    else if (from === null && to !== null) frac = 1 - Math.min(1, Math.abs(to - value) / Math.max(1, Math.abs(to - (segments[idx + 1]?.edge ?? to)) || 3));
    else if (to === null && from !== null) frac = Math.min(1, Math.abs(value - from) / Math.max(1, Math.abs(from - (segments[idx - 2]?.edge ?? from)) || 3));
    const marker = X0 + (idx + Math.min(0.95, Math.max(0.05, frac))) * width;
    const name = NAMES[table.criterion]!;
    return {
      criterion: table.criterion,
      label: name.label,
      unit: name.unit,
      value,
      grade,
      segments,
      marker,
      summary: `${name.label} ${value.toFixed(1)}${name.unit}: USDA ${grade}, ${table.direction === 'higher-is-better' ? 'higher' : 'lower'} is better.`,
    };
  }
}
