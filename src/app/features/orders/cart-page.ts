import { afterNextRender, ChangeDetectionStrategy, Component, inject, signal } from '@angular/core';
import { MatButton } from '@angular/material/button';
import { RouterLink } from '@angular/router';
import { fixed } from '../catalogue/format';
import { MoneyPipe } from '../../shared/ui/money-pipe';
import { CartStore } from './cart-store';

/** What the buyer means to order. Checkout and payment come with the ordering feature. */
@Component({
  selector: 'app-cart-page',
  imports: [MoneyPipe, RouterLink, MatButton],
  templateUrl: './cart-page.html',
  styleUrl: './cart-page.scss',
  changeDetection: ChangeDetectionStrategy.OnPush,
})
export class CartPage {
  protected readonly cart = inject(CartStore);
  /** False until the browser has read the saved cart, so the server never claims the cart is empty. */
  protected readonly ready = signal(false);
  protected readonly fixed = fixed;

  constructor() {
    afterNextRender(() => {
      this.cart.restore();
      this.ready.set(true);
    });
  }
}
