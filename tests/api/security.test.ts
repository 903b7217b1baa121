import fs from 'node:fs';
import supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { User } from '../../server/models/index.ts';
import {
  buildUser,
  getTestApp,
  resetDatabase,
  signedInAgent,
  TEST_PASSWORD,
  tokenFromMail,
  waitForMail,
} from '../support/app.ts';
import { fillPath } from '../support/access-fixtures.ts';
import { listRoutes } from '../support/routes.ts';

// What tests/api/auth.test.ts, users.test.ts and conventions.test.ts already hold is not repeated
// here: this file adds what they leave out (see DEVELOPERS.md, "Guarantees").

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
});

const sidOf = (res: supertest.Response) =>
  /starproof\.sid=([^;]+)/.exec((res.headers['set-cookie'] as unknown as string[] | undefined)?.join(';') ?? '')?.[1];

describe('sessions', () => {
  it('signing in on a browser that already holds a session gives a new session id, and the old one is dead', async () => {
    const first = await buildUser({ role: 'writer' });
    const second = await buildUser({ role: 'editor' });
    const agent = supertest.agent(await getTestApp());
    const a = await agent.post('/api/auth/sign-in').send({ email: first.email, password: TEST_PASSWORD });
    const b = await agent.post('/api/auth/sign-in').send({ email: second.email, password: TEST_PASSWORD });
    const [sidA, sidB] = [sidOf(a), sidOf(b)];
    expect(sidA).toBeTruthy();
    expect(sidB).toBeTruthy();
    expect(sidB).not.toBe(sidA);
    // A fixed (planted) session id is worth nothing after the victim signs in.
    const planted = await supertest(await getTestApp())
      .get('/api/auth/me')
      .set('Cookie', `starproof.sid=${sidA}`);
    expect(planted.status).toBe(401);
    expect((await agent.get('/api/auth/me')).body.data.email).toBe(second.email);
  });

  it('deactivating someone ends every one of their sessions, not only one', async () => {
    const { agent: admin } = await signedInAgent('admin');
    const user = await buildUser({ role: 'reviewer' });
    const browsers = [supertest.agent(await getTestApp()), supertest.agent(await getTestApp())];
    for (const b of browsers)
      expect((await b.post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD })).status).toBe(200);
    expect((await admin.patch(`/api/users/${user.id}`).send({ active: false })).status).toBe(200);
    for (const b of browsers) expect((await b.get('/api/pages')).status).toBe(401);
  });

  it('a signed-out session cookie replayed later is refused', async () => {
    const user = await buildUser();
    const agent = supertest.agent(await getTestApp());
    const sid = sidOf(await agent.post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD }));
    expect((await agent.post('/api/auth/sign-out')).status).toBe(204);
    const replay = await supertest(await getTestApp())
      .get('/api/auth/me')
      .set('Cookie', `starproof.sid=${sid}`);
    expect(replay.status).toBe(401);
  });
});

describe('cross-site request forgery', () => {
  it('every state-changing route refuses a cross-site Origin with 403 cross_site_request', async () => {
    const { agent } = await signedInAgent('admin');
    const app = await getTestApp();
    const changing = listRoutes(app).filter((r) => !['GET', 'HEAD', 'OPTIONS'].includes(r.method));
    expect(changing.length).toBeGreaterThan(40);
    const ids = new Proxy({} as Record<string, string>, { get: () => '00000000-0000-4000-8000-000000000000' });
    const wrong: string[] = [];
    for (const route of changing) {
      const m = route.method.toLowerCase() as 'post' | 'put' | 'patch' | 'delete';
      const path = fillPath(route.path, ids);
      const byOrigin = await agent[m](path).set('Origin', 'https://evil.example').send({});
      const byFetchSite = await agent[m](path).set('Sec-Fetch-Site', 'cross-site').send({});
      for (const [how, res] of [
        ['Origin', byOrigin],
        ['Sec-Fetch-Site', byFetchSite],
      ] as const) {
        if (res.status !== 403 || res.body?.error?.code !== 'cross_site_request')
          wrong.push(`${route.method} ${route.path} (${how}): ${res.status} ${res.body?.error?.code}`);
      }
    }
    expect(wrong, wrong.join('\n')).toEqual([]);
    // Still signed in: a refused request changed nothing, the session included.
    expect((await agent.get('/api/auth/me')).status).toBe(200);
  });

  it('the same site, a look-alike host and an unparsable Origin are told apart', async () => {
    const { agent } = await signedInAgent('writer');
    const same = await agent
      .put('/api/pages/digest')
      .set('Host', 'starproof.example')
      .set('Origin', 'http://starproof.example')
      .send({ enabled: false });
    expect(same.status).toBe(200);
    const lookAlike = await agent
      .put('/api/pages/digest')
      .set('Host', 'starproof.example')
      .set('Origin', 'http://starproof.example.evil.example')
      .send({ enabled: false });
    expect(lookAlike.status).toBe(403);
    const garbage = await agent.put('/api/pages/digest').set('Origin', 'not a url').send({ enabled: false });
    expect(garbage.status).toBe(403);
    const nullOrigin = await agent.put('/api/pages/digest').set('Origin', 'null').send({ enabled: false });
    expect(nullOrigin.status).toBe(403);
  });
});

describe('headers on the API', () => {
  it('JSON answers carry the Content-Security-Policy and the other security headers, errors included', async () => {
    const api = supertest(await getTestApp());
    for (const res of [await api.get('/api/auth/me'), await api.get('/api/public/pages'), await api.get('/api/no-such-route')]) {
      const csp = res.headers['content-security-policy'] ?? '';
      for (const part of [
        "default-src 'self'",
        "script-src 'self'",
        "object-src 'none'",
        "base-uri 'self'",
        "form-action 'self'",
        "frame-ancestors 'none'",
      ])
        expect(csp).toContain(part);
      expect(csp).not.toContain("'unsafe-eval'");
      expect(res.headers['x-content-type-options']).toBe('nosniff');
      expect(res.headers['x-frame-options']).toBe('SAMEORIGIN');
      expect(res.headers['referrer-policy']).toBe('no-referrer');
      expect(res.headers['cross-origin-opener-policy']).toBe('same-origin');
      expect(res.headers['x-powered-by']).toBeUndefined();
      // Plain http in tests: HSTS only over https (see createApp's `https` option).
      expect(res.headers['strict-transport-security']).toBeUndefined();
    }
  });

  it('behind https the session cookie is Secure and HSTS is sent', async () => {
    const { createApp } = await import('../../server/app.ts');
    const app = createApp({ https: true });
    const user = await buildUser();
    const res = await supertest(app)
      .post('/api/auth/sign-in')
      .set('X-Forwarded-Proto', 'https')
      .send({ email: user.email, password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.headers['strict-transport-security']).toMatch(/max-age=\d+/);
    expect(String(res.headers['set-cookie'])).toMatch(/Secure/);
    await (app.locals.sessionPool as { end(): Promise<void> }).end();
  });
});

describe('passwords', () => {
  // The list shipped with the app (server/data/common-passwords.txt); every entry is refused.
  const shipped = fs
    .readFileSync(new URL('../../server/data/common-passwords.txt', import.meta.url), 'utf8')
    .split('\n')
    .map((l) => l.trim())
    .filter((l) => l && !l.startsWith('#'));

  it('the shipped list is there and long enough to matter', () => {
    expect(shipped.length).toBeGreaterThan(50);
  });

  it('refuses common passwords (any case) when a reset link is used, and the link still works after', async () => {
    const user = await buildUser();
    const api = supertest(await getTestApp());
    await api.post('/api/auth/password-reset').send({ email: user.email });
    const token = tokenFromMail(await waitForMail(user.email));
    const before = (await User.findByPk(user.id))!.passwordHash;
    for (const common of [shipped[0], shipped[Math.floor(shipped.length / 2)], shipped.at(-1)!.toUpperCase()]) {
      const res = await api.post('/api/auth/password-reset/complete').send({ token, newPassword: common });
      expect(res.status, common).toBe(400);
      expect(res.body.error.fields.newPassword, common).toMatch(/common|guess/i);
    }
    expect((await User.findByPk(user.id))!.passwordHash).toBe(before);
    const fine = await api.post('/api/auth/password-reset/complete').send({ token, newPassword: 'lantern-above-the-dome' });
    expect(fine.status).toBe(200);
  });
});

describe('sign-in throttling per address', () => {
  it('an address that tries too often gets 429 even with the right password; another address is unaffected', async () => {
    // The limit is read from STARPROOF_SIGNIN_LIMIT at start (tests/setup/api-env.ts sets it high for the suite).
    const limit = Number(process.env.STARPROOF_SIGNIN_LIMIT ?? 30);
    const user = await buildUser();
    const api = supertest(await getTestApp());
    // The app trusts one proxy hop on loopback, so X-Forwarded-For names the caller's address.
    const attacker = '203.0.113.77';
    for (let i = 0; i < limit; i += 1) {
      const res = await api
        .post('/api/auth/sign-in')
        .set('X-Forwarded-For', attacker)
        .send({ email: `guess${i}@example.test` });
      expect(res.status).toBe(400);
    }
    const blocked = await api
      .post('/api/auth/sign-in')
      .set('X-Forwarded-For', attacker)
      .send({ email: user.email, password: TEST_PASSWORD });
    expect(blocked.status).toBe(429);
    expect(blocked.body.error).toMatchObject({ code: 'too_many_requests', message: expect.stringMatching(/Wait/) });
    expect(blocked.headers['set-cookie']).toBeUndefined();
    const other = await api
      .post('/api/auth/sign-in')
      .set('X-Forwarded-For', '198.51.100.20')
      .send({ email: user.email, password: TEST_PASSWORD });
    expect(other.status).toBe(200);
  }, 120_000);
});
