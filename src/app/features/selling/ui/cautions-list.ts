import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import { growerCautions, lotCautions, type CautionInput } from '@shared/safety/lot-cautions';

/** Storage and feeding cautions for a lot, written for its buyers or for its grower; each defers to a professional or local guidance. */
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
  readonly audience = input<'buyer' | 'grower'>('buyer');
  protected readonly cautions = computed(() => (this.audience() === 'grower' ? growerCautions(this.lot()) : lotCautions(this.lot())));
}
