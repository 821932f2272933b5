import { Routes } from '@angular/router';
import { roleGuard } from './core/auth-guard';

export const routes: Routes = [
  { path: '', title: 'Baleproof — lab-tested hay', loadComponent: () => import('./features/home/home-page').then((m) => m.HomePage) },
  { path: 'hay', loadChildren: () => import('./features/catalogue/catalogue.routes').then((m) => m.CATALOGUE_ROUTES) },
  { path: 'planner', title: 'Herd planner — Baleproof', loadComponent: () => import('./features/planner/planner-page').then((m) => m.PlannerPage) },
  { path: 'cart', title: 'Your hay list — Baleproof', loadComponent: () => import('./features/orders/cart-page').then((m) => m.CartPage) },
  { path: 'orders', canMatch: [roleGuard('buyer', 'grower', 'admin')], title: 'Orders — Baleproof', loadComponent: () => import('./features/orders/orders-list-page').then((m) => m.OrdersListPage) },
  { path: 'orders/:id', canMatch: [roleGuard('buyer', 'grower', 'admin')], title: 'Order — Baleproof', loadComponent: () => import('./features/orders/order-page').then((m) => m.OrderPage) },
  { path: 'selling', canMatch: [roleGuard('grower')], loadChildren: () => import('./features/selling/selling.routes').then((m) => m.SELLING_ROUTES) },
  { path: 'admin', canMatch: [roleGuard('admin')], loadChildren: () => import('./features/admin/admin.routes').then((m) => m.ADMIN_ROUTES) },
  { path: 'messages', title: 'Messages — Baleproof', canMatch: [roleGuard('buyer', 'grower')], loadComponent: () => import('./features/messages/inbox-page').then((m) => m.InboxPage) },
  { path: 'messages/:id', title: 'Messages — Baleproof', canMatch: [roleGuard('buyer', 'grower')], loadComponent: () => import('./features/messages/inbox-page').then((m) => m.InboxPage) },
  { path: 'sign-in', title: 'Sign in — Baleproof', loadComponent: () => import('./features/account/sign-in-page').then((m) => m.SignInPage) },
  { path: 'sign-up', title: 'Create an account — Baleproof', loadComponent: () => import('./features/account/sign-up-page').then((m) => m.SignUpPage) },
  { path: 'confirm-email', title: 'Confirm your e-mail — Baleproof', loadComponent: () => import('./features/account/confirm-email-page').then((m) => m.ConfirmEmailPage) },
  { path: '**', title: 'Page not found — Baleproof', loadComponent: () => import('./features/not-found/not-found-page').then((m) => m.NotFoundPage) },
];
