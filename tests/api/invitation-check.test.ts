import supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { AuthToken, User } from '../../server/models/index.ts';
import { hashToken } from '../../server/services/users/index.ts';
import { getTestApp, resetDatabase, signedInAgent, tokenFromMail, waitForMail } from '../support/app.ts';

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
});

const check = async (token: unknown) =>
  await supertest(await getTestApp())
    .post('/api/auth/invitation/check')
    .send({ token });

async function invite(email: string) {
  const { agent } = await signedInAgent('admin');
  const res = await agent.post('/api/users').send({ email, name: 'Invited Person (demo)', role: 'writer' });
  expect(res.status).toBe(201);
  return tokenFromMail(await waitForMail(email));
}

describe('checking an invitation link without using it', () => {
  it('says valid for a fresh link, and checking does not use it up', async () => {
    const token = await invite('fresh.invite@example.test');
    for (let i = 0; i < 3; i += 1) {
      const res = await check(token);
      expect(res.status).toBe(200);
      // Only the state: no name, no address, nothing else a guesser could learn.
      expect(res.body).toEqual({ data: { state: 'valid' } });
    }
    const row = await AuthToken.findOne({ where: { tokenHash: hashToken(token) } });
    expect(row!.usedAt).toBeNull();
    const accepted = await supertest(await getTestApp())
      .post('/api/auth/invitation/accept')
      .send({ token, newPassword: 'comet-tails-point-away' });
    expect(accepted.status).toBe(200);
    expect((await check(token)).body).toEqual({ data: { state: 'used' } });
  });

  it('says expired, invalid for garbage or an unknown token, and invalid for a deactivated account', async () => {
    const token = await invite('late.invite@example.test');
    await AuthToken.update({ expiresAt: new Date(Date.now() - 60_000) }, { where: { tokenHash: hashToken(token) } });
    expect((await check(token)).body).toEqual({ data: { state: 'expired' } });
    for (const garbage of ['', 'x', 'not-a-token-at-all-but-long-enough-to-look-like-one', '%%%<script>']) {
      const res = await check(garbage);
      expect(res.status, garbage).toBe(200);
      expect(res.body).toEqual({ data: { state: 'invalid' } });
    }
    expect((await check('a'.repeat(600))).status).toBe(400);
    expect((await check(undefined)).status).toBe(400);
    const other = await invite('gone.invite@example.test');
    await User.update({ active: false }, { where: { email: 'gone.invite@example.test' } });
    expect((await check(other)).body).toEqual({ data: { state: 'invalid' } });
  });

  it('is rate limited per address (standard RateLimit headers) and a password-reset token is not an invitation', async () => {
    const res = await check('whatever');
    expect(res.headers['ratelimit-policy'] ?? res.headers.ratelimit).toBeDefined();
    const { user } = await signedInAgent('writer');
    await supertest(await getTestApp())
      .post('/api/auth/password-reset')
      .send({ email: user.email });
    const reset = tokenFromMail(await waitForMail(user.email));
    expect((await check(reset)).body).toEqual({ data: { state: 'invalid' } });
  });
});
