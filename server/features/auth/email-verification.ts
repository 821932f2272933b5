import { and, eq, isNull } from 'drizzle-orm';
import type { VerifyEmailAnswer } from '@shared/contracts/auth';
import { plusDays } from '@shared/time/days';
import type { ApiDeps } from '../../api-deps';
import { auditEvents, users } from '../../db/schema';
import { HttpError } from '../../middleware/http-error';
import { addressTakenMail, confirmAddressMail } from './account-mail';
import { emailTokens } from './email-token';

/** How long a confirmation link works. */
export const CONFIRMATION_LINK_DAYS = 2;

const badLink = (message: string) => new HttpError(400, 'invalid_confirmation_link', message);

/**
 * Confirming that an account's e-mail address reaches its owner: the signed link at sign-up (and on
 * request), opening it, and the warning to an address's owner when someone signs up with it again.
 * Every e-mail goes through the outbox.
 */
export class EmailVerification {
  private readonly tokens;

  constructor(private readonly deps: Pick<ApiDeps, 'db' | 'jobs' | 'env' | 'clock'>) {
    this.tokens = emailTokens(deps.env.SESSION_SECRET);
  }

  /** Queues the confirmation link for the user's current address. */
  async sendLink(user: { id: number; email: string; displayName: string }): Promise<void> {
    const validUntil = plusDays(this.deps.clock.now(), CONFIRMATION_LINK_DAYS);
    const token = this.tokens.issue({ userId: user.id, email: user.email, expiresAt: validUntil });
    const link = `${this.deps.env.PUBLIC_URL}/confirm-email?token=${encodeURIComponent(token)}`;
    await this.deps.jobs.enqueueMail(confirmAddressMail({ email: user.email, name: user.displayName }, link, validUntil));
  }

  /** Queues the warning to the owner of an address that already has an account. */
  async warnOwner(email: string): Promise<void> {
    const [owner] = await this.deps.db.select({ email: users.email, name: users.displayName }).from(users).where(eq(users.email, email.toLowerCase()));
    if (owner) await this.deps.jobs.enqueueMail(addressTakenMail(owner, this.deps.env.PUBLIC_URL));
  }

  /**
   * Marks the address confirmed. A forged, damaged or expired link, or one for an address the account no
   * longer has, is refused with 400; a link opened again answers that the address is already confirmed.
   */
  async confirm(token: string): Promise<VerifyEmailAnswer> {
    const reading = this.tokens.read(token);
    if (!reading.ok) throw badLink('This confirmation link is damaged or not from Baleproof. Open the link from the e-mail again, or ask for a new one on your account.');
    const { claims } = reading;
    if (claims.expiresAt.getTime() <= this.deps.clock.now().getTime()) {
      throw badLink(`This confirmation link has expired (links work for ${CONFIRMATION_LINK_DAYS * 24} hours). Sign in and ask for a new one.`);
    }
    const [user] = await this.deps.db.select({ email: users.email, verifiedAt: users.emailVerifiedAt }).from(users).where(eq(users.id, claims.userId));
    if (!user || user.email.toLowerCase() !== claims.email.toLowerCase()) {
      throw badLink('This confirmation link is for an address the account no longer uses. Sign in and ask for a new link.');
    }
    if (user.verifiedAt) return { email: user.email, alreadyConfirmed: true, message: `${user.email} is already confirmed.` };
    const now = this.deps.clock.now();
    const updated = await this.deps.db
      .update(users)
      .set({ emailVerifiedAt: now })
      .where(and(eq(users.id, claims.userId), eq(users.email, user.email), isNull(users.emailVerifiedAt)))
      .returning({ id: users.id });
    if (updated.length === 0) return { email: user.email, alreadyConfirmed: true, message: `${user.email} is already confirmed.` };
    await this.deps.db.insert(auditEvents).values({ actorId: claims.userId, action: 'user.email_confirmed', entityType: 'user', entityId: String(claims.userId) });
    return { email: user.email, alreadyConfirmed: false, message: `Thank you: ${user.email} is confirmed.` };
  }
}
