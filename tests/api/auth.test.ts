import supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { AuthToken, User } from '../../server/models/index.ts';
import {
  buildUser,
  getTestApp,
  resetDatabase,
  signedInAgent,
  TEST_PASSWORD,
  tokenFromMail,
  waitForMail,
} from '../support/app.ts';

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
});

const request = async () => supertest(await getTestApp());

describe('sign-in', () => {
  it('signs in, reports the user, and regenerates the session id', async () => {
    const user = await buildUser({ role: 'editor' });
    const agent = supertest.agent(await getTestApp());
    const res = await agent.post('/api/auth/sign-in').send({ email: user.email.toUpperCase(), password: TEST_PASSWORD });
    expect(res.status).toBe(200);
    expect(res.body.data).toMatchObject({ email: user.email, role: 'editor' });
    const cookie = res.headers['set-cookie']?.[0] ?? '';
    expect(cookie).toMatch(/starproof\.sid=/);
    expect(cookie).toMatch(/HttpOnly/i);
    expect(cookie).toMatch(/SameSite=Lax/i);
    const me = await agent.get('/api/auth/me');
    expect(me.body.data.id).toBe(user.id);
  });

  it('gives the same clear answer for a wrong password and an unknown user', async () => {
    const user = await buildUser();
    const wrong = await (await request()).post('/api/auth/sign-in').send({ email: user.email, password: 'not-the-password' });
    const unknown = await (await request())
      .post('/api/auth/sign-in')
      .send({ email: 'nobody@example.test', password: 'whatever-123' });
    for (const res of [wrong, unknown]) {
      expect(res.status).toBe(401);
      expect(res.body.error).toEqual({ code: 'wrong_credentials', message: expect.stringMatching(/do not match/) });
    }
  });

  it('names the missing field', async () => {
    const res = await (await request()).post('/api/auth/sign-in').send({ email: 'a@example.test' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_input');
    expect(res.body.error.fields.password).toMatch(/password/i);
  });

  it('refuses a too-long field with a message', async () => {
    const res = await (await request())
      .post('/api/auth/sign-in')
      .send({ email: `${'a'.repeat(300)}@example.test`, password: 'x' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.email).toMatch(/at most 254/);
  });

  it('throttles an account after repeated failures, even with the right password', async () => {
    const user = await buildUser();
    const api = await request();
    for (let i = 0; i < 5; i++) await api.post('/api/auth/sign-in').send({ email: user.email, password: 'wrong-password-x' });
    const res = await api.post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD });
    expect(res.status).toBe(429);
    expect(res.body.error.code).toBe('too_many_attempts');
    expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
  });

  it('refuses a deactivated user', async () => {
    const user = await buildUser({ active: false });
    const res = await (await request()).post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD });
    expect(res.status).toBe(401);
  });

  it('signs out and ends the session on the server', async () => {
    const { agent } = await signedInAgent('writer');
    expect((await agent.post('/api/auth/sign-out')).status).toBe(204);
    const me = await agent.get('/api/auth/me');
    expect(me.status).toBe(401);
    expect(me.body.error.code).toBe('not_signed_in');
  });
});

describe('passwords', () => {
  it('changes the password and signs out other sessions', async () => {
    const user = await buildUser();
    const first = supertest.agent(await getTestApp());
    const second = supertest.agent(await getTestApp());
    await first.post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD });
    await second.post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD });
    const res = await first
      .post('/api/auth/password')
      .send({ currentPassword: TEST_PASSWORD, newPassword: 'a-brand-new-phrase' });
    expect(res.status).toBe(204);
    expect((await first.get('/api/auth/me')).status).toBe(200);
    expect((await second.get('/api/auth/me')).status).toBe(401);
  });

  it('refuses a wrong current password and a common new one', async () => {
    const { agent } = await signedInAgent('writer');
    const wrong = await agent
      .post('/api/auth/password')
      .send({ currentPassword: 'nope-nope-nope', newPassword: 'a-brand-new-phrase' });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.fields.currentPassword).toMatch(/not right/);
    const common = await agent.post('/api/auth/password').send({ currentPassword: TEST_PASSWORD, newPassword: 'password123' });
    expect(common.status).toBe(400);
    expect(common.body.error.fields.newPassword).toMatch(/most common/);
  });

  it('resets a password with a single-use e-mailed link', async () => {
    const user = await buildUser();
    const api = await request();
    const res = await api.post('/api/auth/password-reset').send({ email: user.email });
    expect(res.status).toBe(202);
    const token = tokenFromMail(await waitForMail(user.email));
    const done = await api.post('/api/auth/password-reset/complete').send({ token, newPassword: 'moonrise-over-the-fells' });
    expect(done.status).toBe(200);
    const reused = await api.post('/api/auth/password-reset/complete').send({ token, newPassword: 'another-phrase-entirely' });
    expect(reused.status).toBe(400);
    expect(reused.body.error).toMatchObject({ code: 'invalid_token', message: expect.stringMatching(/already been used/) });
    const signIn = await api.post('/api/auth/sign-in').send({ email: user.email, password: 'moonrise-over-the-fells' });
    expect(signIn.status).toBe(200);
  });

  it('answers the same for an unknown address and sends nothing', async () => {
    const res = await (await request()).post('/api/auth/password-reset').send({ email: 'ghost@example.test' });
    expect(res.status).toBe(202);
  });

  it('refuses an expired token without changing anything', async () => {
    const user = await buildUser();
    const api = await request();
    await api.post('/api/auth/password-reset').send({ email: user.email });
    const token = tokenFromMail(await waitForMail(user.email));
    await AuthToken.update({ expiresAt: new Date(Date.now() - 1000) }, { where: { userId: user.id } });
    const before = (await User.findByPk(user.id))!.passwordHash;
    const res = await api.post('/api/auth/password-reset/complete').send({ token, newPassword: 'moonrise-over-the-fells' });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toMatch(/expired/);
    expect((await User.findByPk(user.id))!.passwordHash).toBe(before);
  });

  it('refuses an unknown token', async () => {
    const res = await (await request())
      .post('/api/auth/invitation/accept')
      .send({ token: 'x'.repeat(43), newPassword: 'moonrise-over-the-fells' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('invalid_token');
  });
});
