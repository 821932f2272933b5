import { createHmac, timingSafeEqual } from 'node:crypto';
import { z } from 'zod';

/** What a confirmation link vouches for: this user had this address until this moment. */
export interface EmailTokenClaims {
  userId: number;
  email: string;
  expiresAt: Date;
}

export type EmailTokenReading = { ok: true; claims: EmailTokenClaims } | { ok: false; why: 'malformed' | 'forged' };

const PayloadSchema = z.object({ u: z.number().int().positive(), e: z.string().min(3), x: z.number().int() }).strict();

/**
 * Signs and reads the token in an e-mail confirmation link: base64url JSON, a dot, and an HMAC-SHA256 of
 * that text under a key derived from the session secret for this one purpose (so no other signature of
 * the app can be replayed as a link). Nothing is stored: the user row says whether the link was used.
 */
export function emailTokens(sessionSecret: string) {
  const key = createHmac('sha256', sessionSecret).update('baleproof e-mail confirmation').digest();
  const sign = (body: string) => createHmac('sha256', key).update(body).digest();
  return {
    issue(claims: EmailTokenClaims): string {
      const body = Buffer.from(JSON.stringify({ u: claims.userId, e: claims.email, x: claims.expiresAt.getTime() })).toString('base64url');
      return `${body}.${sign(body).toString('base64url')}`;
    },
    read(token: string): EmailTokenReading {
      const [body, mac, extra] = token.split('.');
      if (!body || !mac || extra !== undefined) return { ok: false, why: 'malformed' };
      const given = Buffer.from(mac, 'base64url');
      const expected = sign(body);
      if (given.length !== expected.length || !timingSafeEqual(given, expected)) return { ok: false, why: 'forged' };
      let json: unknown;
      try {
        json = JSON.parse(Buffer.from(body, 'base64url').toString('utf8'));
      } catch {
        return { ok: false, why: 'malformed' };
      }
      const payload = PayloadSchema.safeParse(json);
      if (!payload.success) return { ok: false, why: 'malformed' };
      return { ok: true, claims: { userId: payload.data.u, email: payload.data.e, expiresAt: new Date(payload.data.x) } };
    },
  };
}
