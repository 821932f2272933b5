import { sql } from 'drizzle-orm';
import { check, index, integer, json, pgTable, text, timestamp, uniqueIndex } from 'drizzle-orm/pg-core';
import { userRole } from './enums';

export const users = pgTable(
  'users',
  {
    id: integer().primaryKey().generatedAlwaysAsIdentity(),
    email: text().notNull(),
    /** scrypt hash in PHC-like form: scrypt$N$r$p$salt$hash (base64). */
    passwordHash: text().notNull(),
    displayName: text().notNull(),
    role: userRole().notNull().default('buyer'),
    zip: text(),
    createdAt: timestamp({ withTimezone: true }).notNull().defaultNow(),
    /** Set while an admin has suspended the account; sign-in and every request are refused. */
    disabledAt: timestamp({ withTimezone: true }),
    disabledReason: text(),
    /** When the owner proved the address by opening the signed link e-mailed at sign-up; null until then. */
    emailVerifiedAt: timestamp({ withTimezone: true }),
  },
  (t) => [
    uniqueIndex('users_email_lower_key').on(sql`lower(${t.email})`),
    index('users_role_idx').on(t.role),
    check('users_email_shape', sql`${t.email} ~ '^[^@\\s]+@[^@\\s]+$'`),
    check('users_display_name_nonempty', sql`length(trim(${t.displayName})) > 0`),
  ],
);

/** Sessions for express-session through connect-pg-simple (its documented table shape). */
export const session = pgTable(
  'session',
  {
    sid: text().primaryKey(),
    sess: json().notNull(),
    expire: timestamp({ precision: 6 }).notNull(),
  },
  (t) => [index('IDX_session_expire').on(t.expire)],
);

