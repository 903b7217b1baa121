import { describe, expect, it } from 'vitest';
import { inject } from 'vitest';
import { startLocalPostgres, stopLocalPostgres } from '../../server/db/local-postgres.ts';
import { DEMO_ACCOUNTS } from '../../server/demo/accounts.ts';
import { TEST_CLUSTER } from '../setup/test-postgres.ts';
import { solidImage } from '../support/media.ts';

const admin = DEMO_ACCOUNTS.find((a) => a.role === 'admin')!;

/** A request with a stopwatch; `fetch` itself is given a generous ceiling so a hang would show. */
async function timed(url: string, init: RequestInit = {}) {
  const started = Date.now();
  const res = await fetch(url, { ...init, signal: AbortSignal.timeout(30_000) });
  return { status: res.status, ms: Date.now() - started, body: await res.text() };
}

describe.skipIf(!!process.env.STARPROOF_TEST_DATABASE_URL)('a database outage while the app runs', () => {
  it('stays up, reports the outage, answers quickly with a clear error, and recovers with nothing lost', async () => {
    const base = inject('baseUrl');
    const signIn = await fetch(`${base}/api/auth/sign-in`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email: admin.email, password: admin.password }),
    });
    const cookie = signIn.headers.get('set-cookie')!.split(';')[0];
    expect((await timed(`${base}/api/health`)).status).toBe(200);

    stopLocalPostgres(TEST_CLUSTER.dataDir);
    const outageStarted = Date.now();
    try {
      const health = await timed(`${base}/api/health`);
      expect(health.status).toBe(503);
      expect(JSON.parse(health.body).database.status).toBe('down');
      expect(health.ms).toBeLessThan(5_000);

      // A signed-in read and an anonymous page both answer, neither hangs.
      const read = await timed(`${base}/api/catalogue/objects`, { headers: { cookie } });
      expect(read.status).toBeGreaterThanOrEqual(500);
      expect(JSON.parse(read.body).error.message).toMatch(/database|try again/i);
      expect(read.ms).toBeLessThan(25_000);
      const shell = await timed(`${base}/`);
      expect(shell.status).toBe(200);

      // Hold the outage for 15 seconds in all, as a restart or failover would.
      const left = 15_000 - (Date.now() - outageStarted);
      if (left > 0) await new Promise((r) => setTimeout(r, left));
    } finally {
      await startLocalPostgres({ ...TEST_CLUSTER, database: 'postgres', fast: true });
    }

    await expect.poll(async () => (await timed(`${base}/api/health`)).status, { timeout: 30_000, interval: 500 }).toBe(200);
    // The session made before the outage still works, and a write lands.
    const me = await timed(`${base}/api/auth/me`, { headers: { cookie } });
    expect(me.status).toBe(200);
    const invite = await timed(`${base}/api/users`, {
      method: 'POST',
      headers: { cookie, 'Content-Type': 'application/json', Origin: base },
      body: JSON.stringify({ email: 'after.outage@example.test', name: 'After Outage', role: 'writer' }),
    });
    expect(invite.status).toBe(201);

    // Background jobs run again: a new image gets its renditions.
    const form = new FormData();
    form.append(
      'file',
      new Blob([new Uint8Array(await solidImage(800, 600, '#203040'))], { type: 'image/jpeg' }),
      'after-outage.jpg',
    );
    const uploaded = await fetch(`${base}/api/media`, { method: 'POST', headers: { cookie, Origin: base }, body: form });
    expect(uploaded.status).toBe(201);
    const mediaId = ((await uploaded.json()) as { data: { id: string } }).data.id;
    await expect
      .poll(
        async () =>
          (
            (await (await fetch(`${base}/api/media/${mediaId}`, { headers: { cookie } })).json()) as {
              data: { renditionsStatus: string };
            }
          ).data.renditionsStatus,
        { timeout: 60_000, interval: 1000 },
      )
      .toBe('ready');
  });
});
