import { ChangeDetectionStrategy, Component } from '@angular/core';

/** 24 plain cards, as many as a catalogue page, in a block that hydrates on interaction. */
@Component({
  selector: 'app-cards-page',
  changeDetection: ChangeDetectionStrategy.OnPush,
  template: `
    @defer (on immediate; hydrate on interaction) {
      <h1>Cards</h1>
      <ul>
        @for (i of items; track i) {
          <li class="card">
            <h2>Card {{ i }}</h2>
            <p>Figure A {{ 100 + i }} · figure B {{ 10 + (i % 9) }} · {{ 200 + i }} per unit</p>
            <p>A line of plain text the size of a short description.</p>
          </li>
        }
      </ul>
    }
  `,
})
export class CardsPage {
  readonly items = Array.from({ length: 24 }, (_, i) => i + 1);
}
