import pg from 'pg';

/** One advisory-lock key for the platform settings row, which every test file shares. */
const KEY = 'test:platform-settings';

/**
 * The platform settings are one row in the shared test database, and Jest runs files in parallel. A test
 * that changes them holds this lock exclusively; a test whose figures depend on them (a fee, a window)
 * holds it shared, so it never reads another file's change half-way. Its own connection, so the API's
 * pool keeps all of its own. Returns the release.
 */
export async function holdSettings(mode: 'read' | 'change'): Promise<() => Promise<void>> {
  const client = new pg.Client({ connectionString: process.env['TEST_DATABASE_URL'] });
  await client.connect();
  try {
    await client.query(mode === 'read' ? 'select pg_advisory_lock_shared(hashtext($1))' : 'select pg_advisory_lock(hashtext($1))', [KEY]);
  } catch (err) {
    await client.end();
    throw err;
  }
  // Ending the session lets the lock go.
  return () => client.end();
}
