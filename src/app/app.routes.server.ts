import { RenderMode, ServerRoute } from '@angular/ssr';

// Every page shows live stock and prices, so pages render per request rather than at build time.
export const serverRoutes: ServerRoute[] = [
  { path: '', renderMode: RenderMode.Server },
  { path: 'hay', renderMode: RenderMode.Server },
  { path: 'hay/compare', renderMode: RenderMode.Server },
  { path: 'hay/:id', renderMode: RenderMode.Server },
  { path: 'planner', renderMode: RenderMode.Server },
  { path: 'cart', renderMode: RenderMode.Server },
  // Orders render on the server for the signed-in reader (never kept: the page cache holds visitors' pages only).
  { path: 'orders', renderMode: RenderMode.Server },
  { path: 'orders/:id', renderMode: RenderMode.Server },
  // Signed-in working pages: rendered in the browser (nothing there for search engines or first paint).
  { path: 'selling', renderMode: RenderMode.Client },
  { path: 'selling/**', renderMode: RenderMode.Client },
  { path: 'admin', renderMode: RenderMode.Client },
  { path: 'admin/**', renderMode: RenderMode.Client },
  { path: 'messages', renderMode: RenderMode.Client },
  { path: 'messages/**', renderMode: RenderMode.Client },
  { path: 'sign-in', renderMode: RenderMode.Server },
  { path: 'sign-up', renderMode: RenderMode.Server },
  { path: 'confirm-email', renderMode: RenderMode.Server },
  { path: '**', renderMode: RenderMode.Server, status: 404 },
];
