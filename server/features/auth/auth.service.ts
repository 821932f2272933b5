import { eq, sql } from 'drizzle-orm';
import type { SessionUser, SignIn, SignUp, UserRole } from '@shared/contracts/auth';
import type { Db } from '../../db/client';
import { auditEvents, users } from '../../db/schema';
import { conflict, HttpError } from '../../middleware/http-error';
import { DUMMY_HASH_PROMISE, hashPassword, verifyPassword } from './password';

const sessionColumns = { id: users.id, email: users.email, displayName: users.displayName, role: users.role, emailVerifiedAt: users.emailVerifiedAt };
const sessionUser = (row: { id: number; email: string; displayName: string; role: UserRole; emailVerifiedAt: Date | null }): SessionUser => ({
  id: row.id,
  email: row.email,
  displayName: row.displayName,
  role: row.role,
  emailVerified: row.emailVerifiedAt !== null,
});

/** A new account of any role: sign-up makes buyers and growers; operators (and the demo) also make admins. */
export interface NewAccount {
  email: string;
  password: string;
  displayName: string;
  role: UserRole;
  /** Where the user is, for distances; optional. */
  zip?: string | null;
  /** When the address was confirmed; only accounts made by operators (and the demo) start confirmed. */
  emailVerifiedAt?: Date;
}

export class AuthService {
  constructor(private readonly db: Db) {}

  /**
   * A self-service sign-up: the new, unconfirmed account, or null when the address already has one (the
   * caller answers both alike, so the form does not reveal which addresses are registered).
   */
  signUp(input: SignUp): Promise<SessionUser | null> {
    return this.insertAccount(input);
  }

  /** Creates an account (409 when the e-mail is taken) and records it in the audit log. */
  async createAccount(input: NewAccount): Promise<SessionUser> {
    const user = await this.insertAccount(input);
    if (!user) throw conflict('email_taken', 'An account with that e-mail already exists. Sign in instead.');
    return user;
  }

  private async insertAccount(input: NewAccount): Promise<SessionUser | null> {
    // Hashed even when the address is taken, so both answers take the same time.
    const passwordHash = await hashPassword(input.password);
    const rows = await this.db
      .insert(users)
      .values({ email: input.email.toLowerCase(), passwordHash, displayName: input.displayName, role: input.role, zip: input.zip ?? null, emailVerifiedAt: input.emailVerifiedAt ?? null })
      .onConflictDoNothing()
      .returning(sessionColumns);
    const user = rows[0];
    if (!user) return null;
    await this.db.insert(auditEvents).values({ actorId: user.id, action: 'user.signed_up', entityType: 'user', entityId: String(user.id) });
    return sessionUser(user);
  }

  /** The user when e-mail and password match an active account; otherwise null (same timing either way). */
  async checkCredentials(input: SignIn): Promise<SessionUser | null> {
    const [row] = await this.db
      .select({ ...sessionColumns, passwordHash: users.passwordHash, disabledAt: users.disabledAt })
      .from(users)
      .where(sql`lower(${users.email}) = ${input.email.toLowerCase()}`);
    const ok = await verifyPassword(input.password, row?.passwordHash ?? (await DUMMY_HASH_PROMISE));
    if (!row || !ok) return null;
    // Only someone who knows the password learns that the account is suspended.
    if (row.disabledAt) throw new HttpError(401, 'account_suspended', 'This account is suspended. Write to Baleproof support if you think this is a mistake.');
    return sessionUser(row);
  }

  async findSessionUser(id: number): Promise<SessionUser | null> {
    const [row] = await this.db.select({ ...sessionColumns, disabledAt: users.disabledAt }).from(users).where(eq(users.id, id));
    if (!row || row.disabledAt) return null;
    return sessionUser(row);
  }
}
