import { ChangeDetectionStrategy, Component, computed, input } from '@angular/core';
import type { EditableLot } from '@shared/contracts/selling';
import { growerCautions, lotCautions, type CautionInput } from '@shared/safety/lot-cautions';

/** What the cautions need from a saved lot; null until its lot and quantity steps are saved. */
export function cautionInputOf(l: EditableLot): CautionInput | null {
  if (!l.lot || !l.quantity) return null;
  return {
    forageClass: l.forageClass,
    baleType: l.quantity.baleType,
    moistureAtBalingPct: l.lot.moistureAtBalingPct,
    storage: l.lot.storage,
    nscFlag: l.evaluation?.nscFlag ?? null,
    forageType: l.lot.forageType,
    nitrateTested: l.analysis?.values['nitrateNo3PctDm'] !== undefined,
    droughtStressed: l.lot.droughtStressed,
    heavyNitrogen: l.lot.heavyNitrogen,
  };
}

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
