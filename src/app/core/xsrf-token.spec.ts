import { DOCUMENT } from '@angular/common';
import { HttpXsrfTokenExtractor, provideHttpClient } from '@angular/common/http';
import { TestBed } from '@angular/core/testing';
import { XsrfTokenFromCookie } from './xsrf-token';

function extractorWith(cookie: string): HttpXsrfTokenExtractor {
  TestBed.configureTestingModule({
    providers: [provideHttpClient(), { provide: HttpXsrfTokenExtractor, useClass: XsrfTokenFromCookie }, { provide: DOCUMENT, useValue: { cookie } }],
  });
  return TestBed.inject(HttpXsrfTokenExtractor);
}

describe('XsrfTokenFromCookie', () => {
  it('reads the __Host- prefixed token that secure deployments set', () => {
    expect(extractorWith('theme=oat; __Host-XSRF-TOKEN=abc.def').getToken()).toBe('abc.def');
  });

  it('reads the plain XSRF-TOKEN cookie of a local http deployment', () => {
    expect(extractorWith('XSRF-TOKEN=n0nce.s1g').getToken()).toBe('n0nce.s1g');
  });

  it('answers null without a token cookie', () => {
    expect(extractorWith('theme=oat').getToken()).toBeNull();
  });
});
