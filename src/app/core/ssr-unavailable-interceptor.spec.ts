import { HttpClient, provideHttpClient, withInterceptors } from '@angular/common/http';
import { HttpTestingController, provideHttpClientTesting } from '@angular/common/http/testing';
import { RESPONSE_INIT } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { firstValueFrom } from 'rxjs';
import { pageUnavailableOnServer } from './ssr-unavailable-interceptor';

// 503 Service Unavailable with Retry-After for a page that cannot be built now (RFC 9110 §15.6.4).
describe('pageUnavailableOnServer', () => {
  const setUp = (response: ResponseInit | null) => {
    TestBed.configureTestingModule({
      providers: [provideHttpClient(withInterceptors([pageUnavailableOnServer])), provideHttpClientTesting(), { provide: RESPONSE_INIT, useValue: response }],
    });
    return { http: TestBed.inject(HttpClient), backend: TestBed.inject(HttpTestingController) };
  };

  it('makes the server-rendered page 503 when its API call finds the database down', async () => {
    const response: ResponseInit = { status: 200 };
    const { http, backend } = setUp(response);
    const call = firstValueFrom(http.get('/api/lots')).catch((e: { status: number }) => e.status);
    backend.expectOne('/api/lots').flush({ error: { code: 'database_unavailable' } }, { status: 503, statusText: 'Service Unavailable' });
    expect(await call).toBe(503);
    expect(response.status).toBe(503);
    expect(response.headers).toMatchObject({ 'Retry-After': '30' });
  });

  it('leaves the page alone for other answers, and in the browser', async () => {
    const response: ResponseInit = { status: 200 };
    const { http, backend } = setUp(response);
    const call = firstValueFrom(http.get('/api/lots/9')).catch((e: { status: number }) => e.status);
    backend.expectOne('/api/lots/9').flush({ error: { code: 'not_found' } }, { status: 404, statusText: 'Not Found' });
    expect(await call).toBe(404);
    expect(response.status).toBe(200);
  });
});
