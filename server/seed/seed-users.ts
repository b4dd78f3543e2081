/** Creates the demo accounts through the auth library, then gives each its role. */
import { eq } from 'drizzle-orm';
import type { Db } from '../db/client';
import { user } from '../db/schema/index';
import type { Auth } from '../lib/auth';
import { DEMO_ACCOUNTS } from './demo-mill';

/** Returns user ids by role; an account left over from an interrupted seed is reused, not duplicated. */
export async function seedDemoUsers(db: Db, auth: Auth): Promise<Record<'admin' | 'seller' | 'buyer', string[]>> {
  const ids: Record<'admin' | 'seller' | 'buyer', string[]> = { admin: [], seller: [], buyer: [] };
  for (const account of DEMO_ACCOUNTS) {
    const [existing] = await db.select({ id: user.id }).from(user).where(eq(user.email, account.email));
    let id = existing?.id;
    if (!id) {
      const created = await auth.api.signUpEmail({ body: { email: account.email, password: account.password, name: account.name } });
      id = created.user.id;
    }
    await db.update(user).set({ role: account.role, emailVerified: true }).where(eq(user.id, id));
    ids[account.role].push(id);
  }
  return ids;
}
