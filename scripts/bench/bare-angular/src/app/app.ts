import { ChangeDetectionStrategy, Component } from '@angular/core';
import { RouterLink, RouterOutlet } from '@angular/router';

@Component({
  selector: 'app-root',
  imports: [RouterOutlet, RouterLink],
  changeDetection: ChangeDetectionStrategy.OnPush,
  template: `
    <header><a routerLink="/">Home</a> · <a routerLink="/cards">Cards</a> · <a routerLink="/about">About</a></header>
    <main><router-outlet /></main>
    <footer>A baseline page for the bench.</footer>
  `,
})
export class App {}
