import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';

export interface StripRow {
  label: string;
  unit: string;
  /** Which way is better for a horse owner choosing hay; rows of each kind are drawn in their own group. */
  better: 'higher' | 'lower';
  values: (number | null)[];
}

const MARKERS = ['A', 'B', 'C', 'D'];
const WIDTH = 320;
const PAD = 14;

/**
 * Lots compared one measure at a time: each measure has its own scale, and measures where more is better are
 * kept apart from those where less is better, so no axis mixes the two. Lots are lettered, not only coloured.
 * Plain SVG, drawn on the server.
 */
@Component({
  selector: 'app-nutrient-strips',
  imports: [DecimalPipe],
  template: `
    <ol class="key" aria-label="Lots in the figure">
      @for (name of lots(); track $index) {
        <li><span class="dot" [attr.data-i]="$index">{{ marker($index) }}</span> {{ name }}</li>
      }
    </ol>
    @for (group of groups(); track group.title) {
      <section class="group" [attr.aria-labelledby]="'strips-' + $index">
        <h3 [id]="'strips-' + $index">{{ group.title }}</h3>
        @for (row of group.rows; track row.label) {
          <figure class="strip">
            <figcaption><strong>{{ row.label }}</strong> <span class="unit">{{ row.unit }}</span></figcaption>
            <svg [attr.viewBox]="'0 0 ' + width + ' 44'" role="img" [attr.aria-label]="row.summary" preserveAspectRatio="xMinYMid meet">
              <line [attr.x1]="pad" [attr.x2]="width - pad" y1="22" y2="22" class="axis" />
              <text [attr.x]="pad" y="42" class="tick">{{ row.min | number: '1.0-1' }}</text>
              <text [attr.x]="width - pad" y="42" class="tick end">{{ row.max | number: '1.0-1' }}</text>
              <text [attr.x]="row.better === 'higher' ? width - pad : pad" y="10" class="tick better" [class.end]="row.better === 'higher'">better</text>
              @for (p of row.points; track p.i) {
                <g [attr.transform]="'translate(' + p.x + ',' + (22 + p.dy) + ')'">
                  <circle r="8" class="dot" [attr.data-i]="p.i" />
                  <text y="4" class="mark">{{ marker(p.i) }}</text>
                </g>
              }
            </svg>
          </figure>
        }
      </section>
    }
  `,
  styles: `
    :host { display: block; }
    .key { list-style: none; padding: 0; margin: 0 0 12px; display: flex; flex-wrap: wrap; gap: 6px 16px; font-size: var(--bp-text-sm); }
    .key li { display: inline-flex; align-items: center; gap: 6px; }
    span.dot { display: inline-grid; place-items: center; width: 20px; height: 20px; border-radius: 50%; color: #fff; font-weight: 700; font-size: 12px; }
    .group { margin-bottom: 12px; }
    h3 { font-size: var(--bp-text-md); margin: 8px 0 4px; }
    .strip { margin: 0 0 4px; max-width: 560px; }
    figcaption { font-size: var(--bp-text-sm); }
    .unit { color: var(--bp-muted); }
    svg { width: 100%; height: auto; display: block; overflow: visible; }
    .axis { stroke: var(--bp-ink); stroke-width: 1.5; }
    .tick { font-size: 10px; fill: var(--bp-muted); }
    .tick.end { text-anchor: end; }
    .better { font-style: italic; }
    .mark { font-size: 10px; font-weight: 700; fill: #fff; text-anchor: middle; }
    [data-i='0'] { fill: #1d2340; background: #1d2340; }
    [data-i='1'] { fill: #9a4a22; background: #9a4a22; }
    [data-i='2'] { fill: #3f6b5a; background: #3f6b5a; }
    [data-i='3'] { fill: #6b4f7a; background: #6b4f7a; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NutrientStrips {
  readonly lots = input.required<string[]>();
  readonly rows = input.required<StripRow[]>();

  protected readonly width = WIDTH;
  protected readonly pad = PAD;

  protected readonly groups = computed(() => {
    const drawn = this.rows().map((row) => this.layout(row));
    return [
      { title: 'More is better', rows: drawn.filter((r) => r.better === 'higher') },
      { title: 'Less is better', rows: drawn.filter((r) => r.better === 'lower') },
    ].filter((g) => g.rows.length > 0);
  });

  protected marker(i: number): string {
    return MARKERS[i] ?? String(i + 1);
  }

  private layout(row: StripRow) {
    const known = row.values.map((v, i) => ({ v, i })).filter((p): p is { v: number; i: number } => p.v !== null);
    const lo = Math.min(...known.map((p) => p.v));
    const hi = Math.max(...known.map((p) => p.v));
    // Pad the scale so two close values stay apart and a single value sits mid-line.
    const span = Math.max(hi - lo, Math.abs(hi) * 0.1, 1);
    const min = Math.max(0, lo - span * 0.25);
    const max = hi + span * 0.25;
    const x = (v: number) => PAD + ((v - min) / (max - min)) * (WIDTH - 2 * PAD);
    const placed: { x: number; i: number; dy: number }[] = [];
    for (const p of known) {
      const px = x(p.v);
      const near = placed.filter((q) => Math.abs(q.x - px) < 14).length;
      placed.push({ x: px, i: p.i, dy: near === 0 ? 0 : near % 2 === 1 ? -9 : 9 });
    }
    const missing = row.values.map((v, i) => (v === null ? this.marker(i) : null)).filter(Boolean);
    const summary =
      `${row.label} (${row.unit}, ${row.better} is better): ` +
      known.map((p) => `${this.marker(p.i)} ${p.v.toFixed(1)}`).join(', ') +
      (missing.length ? `; not tested for ${missing.join(', ')}` : '');
    return { ...row, min, max, points: placed, summary };
  }
}
