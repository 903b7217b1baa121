import supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent, User } from '../../server/models/index.ts';
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

describe('users (admin)', () => {
  it('invites someone who then chooses a password and signs in', async () => {
    const { agent } = await signedInAgent('admin');
    const res = await agent.post('/api/users').send({ email: 'New.Writer@Example.test', name: 'New Writer', role: 'writer' });
    expect(res.status).toBe(201);
    expect(res.body.data).toMatchObject({ email: 'new.writer@example.test', role: 'writer', invitationPending: true });
    const mail = await waitForMail('new.writer@example.test');
    expect(mail.subject).toMatch(/invited/);
    const invitee = supertest.agent(await getTestApp());
    const accepted = await invitee
      .post('/api/auth/invitation/accept')
      .send({ token: tokenFromMail(mail), newPassword: 'comet-tails-point-away' });
    expect(accepted.status).toBe(200);
    expect((await invitee.get('/api/auth/me')).body.data.email).toBe('new.writer@example.test');
    expect(await AuditEvent.count({ where: { action: 'user.invitation_accepted' } })).toBe(1);
  });

  it('refuses a duplicate address and leaves no second row', async () => {
    const { agent } = await signedInAgent('admin');
    const existing = await buildUser();
    const res = await agent.post('/api/users').send({ email: existing.email, name: 'Copy', role: 'writer' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('email_taken');
    expect(await User.count({ where: { email: existing.email } })).toBe(1);
  });

  it('refuses an unknown role with a message naming it', async () => {
    const { agent } = await signedInAgent('admin');
    const res = await agent.post('/api/users').send({ email: 'r@example.test', name: 'R', role: 'astronaut' });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.role).toMatch(/admin, editor, reviewer, writer/);
    expect(await User.count({ where: { email: 'r@example.test' } })).toBe(0);
  });

  it('deactivating someone ends their sessions at once', async () => {
    const { agent: admin } = await signedInAgent('admin');
    const { agent: writer, user } = await signedInAgent('writer');
    expect((await writer.get('/api/auth/me')).status).toBe(200);
    const res = await admin.patch(`/api/users/${user.id}`).send({ active: false });
    expect(res.status).toBe(200);
    expect((await writer.get('/api/auth/me')).status).toBe(401);
    const again = await supertest(await getTestApp())
      .post('/api/auth/sign-in')
      .send({ email: user.email, password: TEST_PASSWORD });
    expect(again.status).toBe(401);
  });

  it('an admin cannot demote or deactivate themselves', async () => {
    const { agent, user } = await signedInAgent('admin');
    const res = await agent.patch(`/api/users/${user.id}`).send({ active: false });
    expect(res.status).toBe(403);
    expect(res.body.error.message).toMatch(/another admin/);
  });

  it.each(['editor', 'reviewer', 'writer'] as const)('a %s gets 403 (not 404 or 500) for user management', async (role) => {
    const { agent } = await signedInAgent(role);
    const target = await buildUser();
    for (const res of [
      await agent.get('/api/users'),
      await agent.post('/api/users').send({ email: 'x@example.test', name: 'X', role: 'admin' }),
      await agent.patch(`/api/users/${target.id}`).send({ role: 'admin' }),
      await agent.get('/api/outbox'),
    ]) {
      expect(res.status).toBe(403);
      expect(res.body.error.code).toBe('forbidden');
    }
    expect((await User.findByPk(target.id))!.role).toBe('writer');
  });

  it('anonymous visitors get 401', async () => {
    const res = await supertest(await getTestApp()).get('/api/users');
    expect(res.status).toBe(401);
  });

  it('a malformed or unknown id is not found, not a crash', async () => {
    const { agent } = await signedInAgent('admin');
    expect((await agent.patch('/api/users/not-a-uuid').send({ name: 'X' })).status).toBe(404);
    expect((await agent.patch('/api/users/00000000-0000-4000-8000-000000000000').send({ name: 'X' })).status).toBe(404);
  });

  it('admins read caught mail in the outbox', async () => {
    const { agent } = await signedInAgent('admin');
    await agent.post('/api/users').send({ email: 'outbox.reader@example.test', name: 'Reader', role: 'reviewer' });
    const res = await agent.get('/api/outbox');
    expect(res.status).toBe(200);
    expect(res.body.meta.catcher).toBe(true);
    expect(res.body.data.some((m: { to: string }) => m.to.includes('outbox.reader@example.test'))).toBe(true);
  });
});
