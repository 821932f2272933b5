import { RenderMode, ServerRoute } from '@angular/ssr';

// Every page shows live stock and prices, so pages render per request rather than at build time.
export const serverRoutes: ServerRoute[] = [
  { path: '', renderMode: RenderMode.Server },
  { path: 'hay', renderMode: RenderMode.Server },
  { path: 'hay/:id', renderMode: RenderMode.Server },
  { path: 'sign-in', renderMode: RenderMode.Server },
  { path: 'sign-up', renderMode: RenderMode.Server },
  { path: '**', renderMode: RenderMode.Server, status: 404 },
];
