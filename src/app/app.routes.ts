import { Routes } from '@angular/router';

export const routes: Routes = [
  { path: '', title: 'Baleproof — lab-tested hay', loadComponent: () => import('./features/home/home-page').then((m) => m.HomePage) },
  { path: 'hay', loadChildren: () => import('./features/catalogue/catalogue.routes').then((m) => m.CATALOGUE_ROUTES) },
  { path: 'sign-in', title: 'Sign in — Baleproof', loadComponent: () => import('./features/account/sign-in-page').then((m) => m.SignInPage) },
  { path: 'sign-up', title: 'Create an account — Baleproof', loadComponent: () => import('./features/account/sign-up-page').then((m) => m.SignUpPage) },
  { path: '**', title: 'Page not found — Baleproof', loadComponent: () => import('./features/not-found/not-found-page').then((m) => m.NotFoundPage) },
];
