import { DOCUMENT } from '@angular/common';
import { HttpXsrfTokenExtractor } from '@angular/common/http';
import { inject, Injectable } from '@angular/core';
import { CSRF_COOKIE_NAMES } from '@shared/contracts/cookies';

/**
 * The CSRF token for Angular's XSRF header, read from the cookie under the name the server uses: with
 * secure cookies `__Host-XSRF-TOKEN`, otherwise `XSRF-TOKEN` (Angular's own extractor knows one fixed name).
 */
@Injectable()
export class XsrfTokenFromCookie implements HttpXsrfTokenExtractor {
  private readonly document = inject(DOCUMENT);

  getToken(): string | null {
    const pairs = (this.document.cookie ?? '').split(';').map((pair) => pair.trim());
    for (const name of CSRF_COOKIE_NAMES) {
      const pair = pairs.find((p) => p.startsWith(`${name}=`));
      const value = pair?.slice(name.length + 1);
      if (value) return safeDecode(value);
    }
    return null;
  }
}

/** The server's tokens are URL-safe already; a value that is not valid percent-encoding is used as it is. */
function safeDecode(value: string): string {
  try {
    return decodeURIComponent(value);
  } catch {
    return value;
  }
}
