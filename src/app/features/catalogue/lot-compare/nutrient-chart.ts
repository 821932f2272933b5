import { afterNextRender, ChangeDetectionStrategy, Component, DestroyRef, effect, ElementRef, inject, input, viewChild } from '@angular/core';
import type { Chart } from 'chart.js';

export interface ChartSeries {
  label: string;
  values: (number | null)[];
}

/**
 * A grouped bar chart drawn by Chart.js in the browser. Chart.js is loaded after the first render,
 * so the server sends the caption and the canvas only; the table beside it carries the same figures.
 */
@Component({
  selector: 'app-nutrient-chart',
  template: `
    <figure>
      <div class="box"><canvas #canvas role="img" [attr.aria-label]="caption()"></canvas></div>
      <figcaption>{{ caption() }}</figcaption>
    </figure>
  `,
  styles: `
    figure { margin: 0; }
    .box { position: relative; height: 320px; }
    figcaption { font-size: 13px; color: var(--mat-sys-on-surface-variant); margin-top: 4px; }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NutrientChart {
  readonly labels = input.required<string[]>();
  readonly series = input.required<ChartSeries[]>();
  readonly caption = input('');
  readonly unit = input('% of dry matter');

  private readonly canvas = viewChild.required<ElementRef<HTMLCanvasElement>>('canvas');
  private chart: Chart | null = null;

  constructor() {
    afterNextRender(async () => {
      const { Chart: ChartJs } = await import('chart.js/auto');
      this.chart = new ChartJs(this.canvas().nativeElement, {
        type: 'bar',
        data: this.data(),
        options: {
          responsive: true,
          maintainAspectRatio: false,
          animation: false,
          scales: { y: { beginAtZero: true, title: { display: true, text: this.unit() } } },
          plugins: { legend: { position: 'bottom' } },
        },
      });
    });
    // Later input changes redraw the same chart.
    effect(() => {
      const data = this.data();
      if (!this.chart) return;
      this.chart.data = data;
      this.chart.update();
    });
    inject(DestroyRef).onDestroy(() => this.chart?.destroy());
  }

  private data() {
    const palette = ['#5b7f2a', '#c08a2e', '#3f6e8c', '#8c4a6b'];
    return {
      labels: this.labels(),
      datasets: this.series().map((s, i) => ({ label: s.label, data: s.values, backgroundColor: palette[i % palette.length] })),
    };
  }
}
