import { User, Venue } from '../models/index.ts';
import { hashPassword, verifyPassword } from '../services/users/index.ts';
import { DEMO_ACCOUNTS, DEMO_VENUE } from './accounts.ts';
import { fillDemoSentenceNames, seedCatalogueDemo } from './catalogue.ts';
import { seedDemoChannels } from './channels.ts';
import { seedDemoKioskScreens } from './kiosk-screens.ts';
import { seedDemoPages } from './pages.ts';
import { seedDemoStatements } from './statements.ts';

/**
 * Creates the demo venue and one account per role, unless they already exist. Idempotent: run at
 * every start; never changes an account a person has since edited.
 */
export async function seedDemo(): Promise<void> {
  await Venue.findOrCreate({ where: { name: DEMO_VENUE.name }, defaults: { ...DEMO_VENUE, isDemo: true } });
  for (const account of DEMO_ACCOUNTS) {
    const existing = await User.findOne({ where: { email: account.email } });
    if (existing) continue;
    await User.create({
      email: account.email,
      name: account.name,
      role: account.role,
      passwordHash: await hashPassword(account.password),
    });
  }
  await seedCatalogueDemo();
  await fillDemoSentenceNames();
  await seedDemoStatements();
  await seedDemoKioskScreens();
  await seedDemoPages();
  await seedDemoChannels();
}

/**
 * In production no account may still use a published demo password.
 * @returns the e-mail addresses that do
 */
export async function accountsWithDemoPasswords(): Promise<string[]> {
  const found: string[] = [];
  for (const account of DEMO_ACCOUNTS) {
    const user = await User.findOne({ where: { email: account.email } });
    if (user && (await verifyPassword(account.password, user.passwordHash))) found.push(account.email);
  }
  return found;
}
