import { Routes } from '@angular/router';

export const SELLING_ROUTES: Routes = [
  { path: '', title: 'My lots — Baleproof', loadComponent: () => import('./dashboard/selling-dashboard').then((m) => m.SellingDashboard) },
  { path: 'farm', title: 'Farm profile — Baleproof', loadComponent: () => import('./farm/farm-profile-page').then((m) => m.FarmProfilePage) },
  { path: 'calendar', title: 'Delivery calendar — Baleproof', loadComponent: () => import('./calendar/delivery-calendar-page').then((m) => m.DeliveryCalendarPage) },
  { path: 'lots/new', title: 'New lot — Baleproof', loadComponent: () => import('./lot-form/lot-form-page').then((m) => m.LotFormPage) },
  { path: 'lots/:id', title: 'Edit lot — Baleproof', loadComponent: () => import('./lot-form/lot-form-page').then((m) => m.LotFormPage) },
];
