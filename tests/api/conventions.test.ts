import supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { getTestApp, resetDatabase } from '../support/app.ts';

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
});

describe('API conventions', () => {
  it('health checks the database', async () => {
    const res = await supertest(await getTestApp()).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: 'ok', database: { status: 'up' } });
  });

  it('unknown API paths answer 404 in the error shape', async () => {
    const res = await supertest(await getTestApp()).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.headers['content-type']).toMatch(/json/);
    expect(res.body.error).toEqual({ code: 'not_found', message: 'There is no API endpoint GET /api/no-such-thing.' });
  });

  it('malformed JSON gets a clear 400 and no stack trace', async () => {
    const res = await supertest(await getTestApp())
      .post('/api/auth/sign-in')
      .set('Content-Type', 'application/json')
      .send('{"email": ');
    expect(res.status).toBe(400);
    expect(res.body.error).toEqual({ code: 'malformed_json', message: 'The request body is not valid JSON.' });
    expect(JSON.stringify(res.body)).not.toMatch(/at .*\.ts/);
  });

  it('sends security headers and a Content-Security-Policy', async () => {
    const res = await supertest(await getTestApp()).get('/api/health');
    const csp = res.headers['content-security-policy'];
    expect(csp).toContain("default-src 'self'");
    expect(csp).toContain("script-src 'self'");
    expect(csp).toContain("object-src 'none'");
    expect(csp).toContain("frame-ancestors 'none'");
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['x-powered-by']).toBeUndefined();
  });

  it('refuses a state-changing request from another site', async () => {
    const res = await supertest(await getTestApp())
      .post('/api/auth/sign-in')
      .set('Origin', 'https://evil.example')
      .send({ email: 'a@example.test', password: 'whatever-123' });
    expect(res.status).toBe(403);
    expect(res.body.error.code).toBe('cross_site_request');
  });
});
