import { execFile } from 'node:child_process';
import { join } from 'node:path';
import { promisify } from 'node:util';
import { readEnv } from './env';

const own = { SESSION_SECRET: 'a-long-secret-of-our-own-0123456789', ADMIN_PASSWORD: 'our-own-admin-password', STRIPE_WEBHOOK_SECRET: 'whsec_our_own' };

describe('readEnv in production', () => {
  it('refuses each published default secret, naming the variable', () => {
    expect(() => readEnv({ NODE_ENV: 'production' })).toThrow(/SESSION_SECRET[\s\S]*ADMIN_PASSWORD[\s\S]*STRIPE_WEBHOOK_SECRET/);
    for (const name of Object.keys(own) as (keyof typeof own)[]) {
      const withDefault = { ...own, NODE_ENV: 'production', [name]: undefined };
      expect(() => readEnv(withDefault)).toThrow(new RegExp(`${name}: must be set`));
    }
  });

  it('refuses a default secret set explicitly, too', () => {
    expect(() => readEnv({ ...own, NODE_ENV: 'production', SESSION_SECRET: 'baleproof-local-dev-session-secret' })).toThrow(/SESSION_SECRET/);
  });

  it('starts with secrets of its own, and keeps the defaults for development', () => {
    expect(readEnv({ ...own, NODE_ENV: 'production' }).SESSION_SECRET).toBe(own.SESSION_SECRET);
    expect(() => readEnv({ NODE_ENV: 'development' })).not.toThrow();
  });

  it('the demo seed refuses to run in production (its accounts have published passwords)', async () => {
    const root = join(__dirname, '..');
    const run = promisify(execFile)(process.execPath, ['--import', 'tsx', 'scripts/seed/seed-cli.ts'], {
      cwd: root,
      env: { ...process.env, ...own, NODE_ENV: 'production', DATABASE_URL: 'postgres://nobody@127.0.0.1:1/none' },
    });
    await expect(run).rejects.toMatchObject({ code: 1, stderr: expect.stringContaining('does not run with NODE_ENV=production') });
  });
});
