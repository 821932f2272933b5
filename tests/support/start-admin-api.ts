import { signedInUser } from './grower-lot';
import { startTestApi, type TestApi } from './test-api';

export type SignedInUser = Awaited<ReturnType<typeof signedInUser>>;

/**
 * The test API with an admin already signed in: the set-up every admin-side spec starts with.
 * Takes the same arguments as `startTestApi`; close it with `t.close()`.
 */
export async function startAdminApi(...args: Parameters<typeof startTestApi>): Promise<{ t: TestApi; admin: SignedInUser }> {
  const t = await startTestApi(...args);
  const admin = await signedInUser(t, 'admin');
  return { t, admin };
}
