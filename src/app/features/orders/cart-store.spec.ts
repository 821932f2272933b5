import { PLATFORM_ID } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { CartStore, type CartLine } from './cart-store';

const line = (lotId: number, tons: number, hayCents: number, freightCents: number | null = 0): CartLine => ({
  lotId,
  title: `Lot ${lotId}`,
  farmName: 'Invented Farm',
  tons,
  bales: Math.ceil((tons * 2000) / 60),
  hayCents,
  freightCents,
});

describe('CartStore', () => {
  beforeEach(() => localStorage.clear());

  it('adds plan lines, replaces a lot already in the cart, and totals hay and freight in cents', () => {
    const cart = TestBed.inject(CartStore);
    cart.addLines([line(1, 2, 60000, 10500), line(2, 1.5, 45000, null)]);
    cart.addLines([line(1, 3, 90000, 10500)]);
    expect(cart.lines().map((l) => [l.lotId, l.tons])).toEqual([[2, 1.5], [1, 3]]);
    expect(cart.hayCents()).toBe(135000);
    expect(cart.freightCents()).toBe(10500);
    expect(cart.totalCents()).toBe(145500);
    expect(cart.tons()).toBeCloseTo(4.5, 9);
  });

  it('keeps the cart in localStorage in the browser and restores it, dropping damaged entries', () => {
    TestBed.inject(CartStore).addLines([line(7, 1, 30000)]);
    localStorage.setItem('baleproof.cart.v1', JSON.stringify([...JSON.parse(localStorage.getItem('baleproof.cart.v1')!), { lotId: 'x' }]));
    TestBed.resetTestingModule();
    const again = TestBed.inject(CartStore);
    expect(again.count()).toBe(0); // nothing until restored after the first render
    again.restore();
    expect(again.lines().map((l) => l.lotId)).toEqual([7]);
  });

  it('never touches storage on the server', () => {
    TestBed.configureTestingModule({ providers: [{ provide: PLATFORM_ID, useValue: 'server' }] });
    const cart = TestBed.inject(CartStore);
    cart.addLines([line(3, 1, 100)]);
    cart.restore();
    expect(localStorage.getItem('baleproof.cart.v1')).toBeNull();
    expect(cart.count()).toBe(1);
  });
});
