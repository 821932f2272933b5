import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { lotCautions, type CautionInput } from '@shared/safety/lot-cautions';

/** Storage and feeding cautions for a lot; each defers to a veterinarian or local guidance. */
@Component({
  selector: 'app-cautions-list',
  template: `
    <section class="cautions" aria-label="Cautions">
      @for (c of cautions(); track c.code) {
        <div class="bp-caution"><strong>{{ c.title }}.</strong> {{ c.message }}</div>
      }
    </section>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CautionsList {
  readonly lot = input.required<CautionInput>();
  protected readonly cautions = computed(() => lotCautions(this.lot()));
}
