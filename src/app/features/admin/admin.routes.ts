import { Routes } from '@angular/router';

export const ADMIN_ROUTES: Routes = [
  { path: '', title: 'Review desk — Baleproof', loadComponent: () => import('./review-queue-page').then((m) => m.ReviewQueuePage) },
  { path: 'lots/:id', title: 'Review a lot — Baleproof', loadComponent: () => import('./review-lot-page').then((m) => m.ReviewLotPage) },
  { path: 'overview', title: 'Overview — Baleproof', loadComponent: () => import('./overview-page').then((m) => m.OverviewPage) },
  { path: 'payouts', title: 'Payouts — Baleproof', loadComponent: () => import('./payouts-page').then((m) => m.PayoutsPage) },
  { path: 'claims', title: 'Quality claims — Baleproof', loadComponent: () => import('./claims-page').then((m) => m.ClaimsPage) },
  { path: 'users', title: 'Users — Baleproof', loadComponent: () => import('./users-page').then((m) => m.UsersPage) },
  { path: 'settings', title: 'Settings — Baleproof', loadComponent: () => import('./settings-page').then((m) => m.SettingsPage) },
  { path: 'audit', title: 'Audit trail — Baleproof', loadComponent: () => import('./audit-page').then((m) => m.AuditPage) },
];
