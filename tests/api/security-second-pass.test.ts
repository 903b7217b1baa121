import supertest from 'supertest';
import { afterEach, beforeAll, describe, expect, it } from 'vitest';
import { spawnSync } from 'node:child_process';
import { createApp } from '../../server/app.ts';
import { config } from '../../server/config.ts';
import { buildSource } from '../support/catalogue.ts';
import { buildUser, getTestApp, resetDatabase, signedInAgent, TEST_PASSWORD } from '../support/app.ts';

/** Settings are read from the environment when asked, so a test changes the variable itself. */
const setEnv = (name: string, value: string | number | undefined) => {
  if (value === undefined) delete process.env[name];
  else process.env[name] = String(value);
};

// Issue 15, points 9, 11, 13 and 14 (server side): the small leaks.

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
});

const savedPublicUrl = config.publicUrl;
afterEach(() => {
  setEnv('PUBLIC_URL', savedPublicUrl);
});

describe('broken percent-encoding (point 9)', () => {
  it('answers 400 malformed_url, never a 500, on the API and the image files', async () => {
    const api = supertest(await getTestApp());
    for (const path of ['/api/public/pages/%ff', '/media/files/%ff']) {
      const res = await api.get(path);
      expect(res.status, path).toBe(400);
      expect(res.body.error.code, path).toBe('malformed_url');
    }
  });
});

describe('no-store on signed-in answers (point 11)', () => {
  it('every answer to a signed-in person carries Cache-Control: no-store, the public API and sign-in included', async () => {
    const { agent, user } = await signedInAgent('admin');
    for (const path of ['/api/auth/me', '/api/outbox', '/api/users', '/api/pages', '/api/catalogue/sources', '/api/public/pages'])
      expect((await agent.get(path)).headers['cache-control'], path).toBe('no-store');
    const signIn = await supertest(await getTestApp())
      .post('/api/auth/sign-in')
      .send({ email: user.email, password: TEST_PASSWORD });
    expect(signIn.headers['cache-control']).toBe('no-store');
    // Anonymous readers of the public API still get the shared cache's rule.
    expect((await supertest(await getTestApp()).get('/api/public/pages')).headers['cache-control']).toMatch(/^public/);
  });
});

describe('proxies, origins and the Atom base (point 13)', () => {
  it('the Atom feed never takes its links from the Host header', async () => {
    setEnv('PUBLIC_URL', undefined);
    const res = await supertest(await getTestApp())
      .get('/api/public/pages.atom')
      .set('Host', 'evil.example');
    expect(res.status).toBe(200);
    expect(res.text).not.toContain('evil.example');
    expect(res.text).toContain(`http://${config.host}:${config.port}/api/public/pages.atom`);
    setEnv('PUBLIC_URL', 'https://planetarium.example');
    const configured = await supertest(await getTestApp())
      .get('/api/public/pages.atom')
      .set('Host', 'evil.example');
    expect(configured.text).toContain('https://planetarium.example/api/public/pages.atom');
  });

  it('with PUBLIC_URL set, the Origin must match its scheme and host; the Host header does not matter', async () => {
    const { agent } = await signedInAgent('writer');
    setEnv('PUBLIC_URL', 'https://planetarium.example');
    const send = (origin: string, host = 'planetarium.example') =>
      agent.put('/api/pages/digest').set('Host', host).set('Origin', origin).send({ enabled: false });
    expect((await send('https://planetarium.example')).status).toBe(200);
    expect((await send('http://planetarium.example')).status).toBe(403);
    expect((await send('https://evil.example', 'evil.example')).status).toBe(403);
  });

  it('without PUBLIC_URL the scheme counts too: an http page may not post to the https site', async () => {
    const { agent } = await signedInAgent('writer');
    setEnv('PUBLIC_URL', undefined);
    const res = await agent
      .put('/api/pages/digest')
      .set('Host', 'starproof.example')
      .set('Origin', 'https://starproof.example')
      .send({ enabled: false });
    expect(res.status).toBe(403);
  });

  it('X-Forwarded-Host and X-Forwarded-For from a peer that is not a trusted proxy are ignored', async () => {
    const saved = config.trustProxy;
    setEnv('TRUST_PROXY', '192.0.2.1'); // some proxy, not this (loopback) client
    const app = createApp();
    setEnv('TRUST_PROXY', saved);
    setEnv('PUBLIC_URL', undefined);
    try {
      const user = await buildUser();
      const agent = supertest.agent(app);
      expect((await agent.post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD })).status).toBe(200);
      const spoofed = await agent
        .put('/api/pages/digest')
        .set('Host', 'starproof.example')
        .set('X-Forwarded-Host', 'evil.example')
        .set('Origin', 'http://evil.example')
        .send({ enabled: false });
      expect(spoofed.status).toBe(403);
      // Rotating X-Forwarded-For does not make an untrusted client look like new addresses to the limits.
      const ips = new Set<string>();
      app.get('/ip-probe', (req, res) => res.json({ ip: req.ip }));
      for (const forwarded of ['203.0.113.1', '203.0.113.2'])
        ips.add((await supertest(app).get('/ip-probe').set('X-Forwarded-For', forwarded)).body.ip);
      expect(ips.size).toBe(1);
      expect([...ips][0]).toMatch(/127\.0\.0\.1$/);
    } finally {
      await (app.locals.sessionPool as { end(): Promise<void> }).end();
    }
  });

  it('production refuses to start without PUBLIC_URL, and says why', () => {
    const env: NodeJS.ProcessEnv = { ...process.env, NODE_ENV: 'production', DATABASE_URL: 'postgres://nobody@127.0.0.1:1/none' };
    delete env.PUBLIC_URL;
    const run = spawnSync(process.execPath, ['--import', 'tsx', 'server/cli/start.ts'], {
      env,
      encoding: 'utf8',
      timeout: 60_000,
    });
    expect(run.status).toBe(1);
    expect(run.stderr).toMatch(/PUBLIC_URL is not set/);
  }, 70_000);
});

describe('odds and ends (point 14)', () => {
  it('source search takes % and _ literally', async () => {
    const { agent } = await signedInAgent('editor');
    await buildSource({ citation: 'Corrie Vale survey (demo), 50% complete' });
    await buildSource({ citation: 'Corrie Vale survey (demo), 50 fields complete' });
    const pct = await agent.get('/api/catalogue/sources').query({ q: '50%' });
    expect(pct.body.data.map((s: { citation: string }) => s.citation)).toEqual(['Corrie Vale survey (demo), 50% complete']);
    const underscore = await agent.get('/api/catalogue/sources').query({ q: 'vale_survey' });
    expect(underscore.body.data).toEqual([]);
  });

  it("a PostgreSQL error is logged as one short JSON line, without the driver's connection objects", async () => {
    const { getSequelize } = await import('../../server/db.ts');
    const { serializeError } = await import('../../server/logger.ts');
    const pg = await import('pg');
    const raw = new pg.default.Client({ connectionString: process.env.DATABASE_URL });
    await raw.connect();
    const errors = [
      await getSequelize()
        .query('SELECT * FROM no_such_table')
        .catch((e: unknown) => e),
      await raw.query('SELECT * FROM no_such_table').catch((e: unknown) => e),
    ];
    // pg-pool hands idle-connection errors over with the client attached (`err.client = client`):
    // that is what filled the log during an outage.
    Object.assign(errors[1] as object, { client: raw });
    await raw.end();
    for (const err of errors) {
      const line = JSON.stringify(serializeError(err));
      expect(line).not.toMatch(/connectionParameters|_queryQueue|"client"/);
      expect(line.length).toBeLessThan(4_000);
      expect(line).toMatch(/no_such_table/);
    }
  });

  it('committing an import that does not exist answers 404', async () => {
    const { agent } = await signedInAgent('admin');
    const res = await agent.post('/api/catalogue/imports/00000000-0000-4000-8000-000000000000/commit').send({});
    expect(res.status).toBe(404);
    expect(res.body.error.code).toBe('not_found');
  });
});
