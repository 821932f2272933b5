import { Routes } from '@angular/router';

export const ADMIN_ROUTES: Routes = [
  { path: '', title: 'Review desk — Baleproof', loadComponent: () => import('./review-queue-page').then((m) => m.ReviewQueuePage) },
  { path: 'lots/:id', title: 'Review a lot — Baleproof', loadComponent: () => import('./review-lot-page').then((m) => m.ReviewLotPage) },
];
