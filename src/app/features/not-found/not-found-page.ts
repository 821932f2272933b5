import { ChangeDetectionStrategy, Component } from '@angular/core';
import { RouterLink } from '@angular/router';

@Component({
  selector: 'app-not-found-page',
  imports: [RouterLink],
  template: `
    <div class="bp-page">
      <h1>Page not found</h1>
      <p>There is nothing at this address. It may have moved, or the lot may have sold.</p>
      <p><a routerLink="/hay">Browse hay</a> · <a routerLink="/">Home</a></p>
    </div>
  `,
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class NotFoundPage {}
