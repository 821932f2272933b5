import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { gradeStanding, gradesOf, type GradeScaleName } from '@shared/forage/grade-scale';

const SCALE_PREFIX: Record<GradeScaleName, string> = { 'usda-alfalfa': 'USDA', 'usda-grass': 'USDA', afgc: 'AFGC' };

/**
 * A grade on its ordered table: one bar per grade, filled up to this grade (more bars = better), the name
 * in words and the standing for screen readers. Colour follows the rank but never carries it alone.
 */
@Component({
  selector: 'app-grade-mark',
  template: `
    @if (standing(); as s) {
      <span class="mark" [attr.data-rank]="s.rank" [attr.title]="title()">
        <span class="bars" aria-hidden="true">
          @for (filled of bars(); track $index) { <i [class.on]="filled"></i> }
        </span>
        <span class="name">{{ prefix() }} {{ s.name }}</span>
        <span class="bp-visually-hidden">, {{ ordinal(s.rank) }} of {{ s.of }} grades</span>
      </span>
    } @else {
      <span class="mark">{{ prefix() }} {{ name() }}</span>
    }
  `,
  styles: `
    .mark { display: inline-flex; align-items: center; gap: 6px; font-weight: 700; font-size: var(--bp-text-sm); color: var(--bp-ink); white-space: nowrap; }
    .bars { display: inline-flex; align-items: flex-end; gap: 2px; height: 14px; }
    .bars i { display: block; width: 4px; background: var(--bp-rule); border-radius: 1px; }
    .bars i:nth-child(1) { height: 6px; } .bars i:nth-child(2) { height: 8px; } .bars i:nth-child(3) { height: 10px; }
    .bars i:nth-child(4) { height: 12px; } .bars i:nth-child(5) { height: 14px; } .bars i:nth-child(6) { height: 14px; }
    [data-rank='1'] .on { background: var(--bp-grade-1); }
    [data-rank='2'] .on { background: var(--bp-grade-2); }
    [data-rank='3'] .on { background: var(--bp-grade-3); }
    [data-rank='4'] .on { background: var(--bp-grade-4); }
    [data-rank='5'] .on, [data-rank='6'] .on { background: var(--bp-grade-5); }
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class GradeMark {
  readonly name = input.required<string>();
  readonly scale = input.required<GradeScaleName>();

  protected readonly standing = computed(() => gradeStanding(this.name(), this.scale()));
  protected readonly prefix = computed(() => SCALE_PREFIX[this.scale()]);
  /** Bars left to right from the lowest grade; a grade fills its own bar and every one below it. */
  protected readonly bars = computed(() => {
    const s = this.standing();
    if (!s) return [];
    const filled = s.of - s.rank + 1;
    return Array.from({ length: s.of }, (_, i) => i < filled);
  });
  protected readonly title = computed(() => `Grades best to lowest: ${gradesOf(this.scale()).join(', ')}`);

  protected ordinal(n: number): string {
    return ['best', '2nd', '3rd', '4th', '5th', '6th'][n - 1] ?? `${n}th`;
  }
}
