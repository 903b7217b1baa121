import type { Express } from 'express';
import { QueryTypes } from 'sequelize';
import supertest from 'supertest';
import { afterAll } from 'vitest';
import type { Role } from '../../shared/roles.ts';
import { createApp } from '../../server/app.ts';
import { closeSequelize, getSequelize } from '../../server/db.ts';
import { startMailCatcher } from '../../server/mail/catcher.ts';
import { routeMailToCatcher } from '../../server/mail/mailer.ts';
import { OutboxMessage, User } from '../../server/models/index.ts';
import { hashPassword } from '../../server/services/users/passwords.ts';

let app: Express | undefined;
let catcher: Awaited<ReturnType<typeof startMailCatcher>> | undefined;

/** The real Express app on the real test database, with a mail catcher on a free port. */
export async function getTestApp(): Promise<Express> {
  if (!app) {
    app = createApp();
    catcher = await startMailCatcher(0);
    routeMailToCatcher(catcher.port);
    afterAll(async () => {
      catcher?.server.close(() => undefined);
      await (app?.locals.sessionPool as { end(): Promise<void> } | undefined)?.end();
      await closeSequelize();
      app = undefined;
    });
  }
  return app;
}

/** Empties every table but the migration log, so each test file starts clean. */
export async function resetDatabase(): Promise<void> {
  const tables = await getSequelize().query<{ tablename: string }>(
    "SELECT tablename FROM pg_tables WHERE schemaname = 'public' AND tablename <> 'schema_migrations'",
    { type: QueryTypes.SELECT },
  );
  if (tables.length)
    await getSequelize().query(`TRUNCATE ${tables.map((t) => `"${t.tablename}"`).join(', ')} RESTART IDENTITY CASCADE`);
}

export const TEST_PASSWORD = 'glass-telescope-42';

let counter = 0;
/** Creates a user who can sign in with TEST_PASSWORD. */
export async function buildUser(
  overrides: Partial<{ role: Role; email: string; name: string; active: boolean; password: string | null }> = {},
) {
  counter += 1;
  const password = overrides.password === undefined ? TEST_PASSWORD : overrides.password;
  return User.create({
    email: overrides.email ?? `person${counter}-${Date.now()}@example.test`,
    name: overrides.name ?? `Test Person ${counter}`,
    role: overrides.role ?? 'writer',
    active: overrides.active ?? true,
    passwordHash: password ? await hashPassword(password) : null,
  });
}

/** A supertest agent that keeps cookies, already signed in as a new user of the role. */
export async function signedInAgent(role: Role) {
  const user = await buildUser({ role });
  const agent = supertest.agent(await getTestApp());
  const res = await agent.post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD });
  if (res.status !== 200) throw new Error(`sign-in failed: ${res.status} ${JSON.stringify(res.body)}`);
  return { agent, user };
}

/** Waits for a caught message to the address (SMTP delivery is asynchronous). */
export async function waitForMail(to: string, timeoutMs = 5_000): Promise<OutboxMessage> {
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const found = await OutboxMessage.findOne({ where: { toAddresses: to }, order: [['receivedAt', 'DESC']] });
    if (found) return found;
    if (Date.now() > deadline) throw new Error(`no mail to ${to}`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

/** Pulls the token out of an e-mailed link. */
export function tokenFromMail(message: OutboxMessage): string {
  const match = /token=([A-Za-z0-9_%-]+)/.exec(message.textBody);
  if (!match) throw new Error('no token in mail');
  return decodeURIComponent(match[1]);
}
