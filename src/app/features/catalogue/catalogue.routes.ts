import { Routes } from '@angular/router';

export const CATALOGUE_ROUTES: Routes = [
  { path: '', title: 'Find hay — Baleproof', loadComponent: () => import('./lot-search/lot-search-page').then((m) => m.LotSearchPage) },
  { path: 'compare', title: 'Compare hay — Baleproof', loadComponent: () => import('./lot-compare/lot-compare-page').then((m) => m.LotComparePage) },
  { path: ':id', title: 'Hay lot — Baleproof', loadComponent: () => import('./lot-page/lot-page').then((m) => m.LotPage) },
];
