import { DecimalPipe } from '@angular/common';
import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { HerdNeedsPlan } from '@shared/planner/herd-needs';
import { HORSE_CLASS_OPTIONS } from './herd-draft';
import { herdTables } from './herd-rows';
import type { ReaderUnit } from './reader-units';
import { StackedBars } from './stacked-bars';

const classLabel = (value: string) => HORSE_CLASS_OPTIONS.find((c) => c.value === value)?.label ?? value;

/** The herd's daily needs and the period's hay as tables and a chart, in the unit the herd was entered in. */
@Component({
  selector: 'app-herd-results',
  imports: [DecimalPipe, StackedBars],
  templateUrl: './herd-results.html',
  styleUrl: './herd-results.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class HerdResults {
  readonly plan = input.required<HerdNeedsPlan>();
  readonly unit = input.required<ReaderUnit>();
  /** The chosen lot's dry matter, % as-fed; null without a lot. */
  readonly dryMatterPct = input<number | null>(null);

  protected readonly tables = computed(() => herdTables(this.plan(), this.unit(), classLabel, this.dryMatterPct()));

  /** Hay a day per group: the dry matter, and with a lot the water that makes it up to as-fed weight. */
  protected readonly bars = computed(() =>
    this.tables().groups.map((g, i) => ({
      label: `Group ${i + 1}: ${g.label}`,
      parts: g.hayAsFed ? [g.hayDryMatter.value, g.hayAsFed.value - g.hayDryMatter.value] : [g.hayDryMatter.value],
    })),
  );
  protected readonly partNames = computed(() => (this.dryMatterPct() ? ['Dry matter', 'Water (as-fed weight less dry matter)'] : ['Dry matter']));
}
