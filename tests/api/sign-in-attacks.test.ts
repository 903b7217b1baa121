import fs from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import supertest from 'supertest';
import { beforeAll, describe, expect, it, vi } from 'vitest';
import {
  runHashJob,
  closePasswordPool,
  hashJobsCompleted,
  type SignInTicket,
  signInWouldWaitTooLong,
  tryAdmitSignIn,
} from '../../server/auth/password-pool.ts';
import { config } from '../../server/config.ts';
import { getSequelize } from '../../server/db.ts';
import { FREE_ATTEMPTS, purgeOldSignInAttempts } from '../../server/services/users/sign-in.ts';
import { OutboxMessage } from '../../server/models/index.ts';
import { buildUser, getTestApp, resetDatabase, TEST_PASSWORD, tokenFromMail, waitForMail } from '../support/app.ts';

/** Settings are read from the environment when asked, so a test changes the variable itself. */
const setEnv = (name: string, value: string | number | undefined) => {
  if (value === undefined) delete process.env[name];
  else process.env[name] = String(value);
};

// Issue 15, points 1, 2, 6 and 7: sign-in and password resets under attack.

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
});

const api = async () => supertest(await getTestApp());

describe('parallel guesses (point 1)', () => {
  it('60 wrong guesses and the right password at once: no more than the free attempts are compared', async () => {
    const user = await buildUser();
    const app = await api();
    const before = hashJobsCompleted();
    const guesses = Array.from({ length: 60 }, (_, i) =>
      app
        .post('/api/auth/sign-in')
        .set('X-Forwarded-For', `203.0.113.${i + 1}`)
        .send({ email: user.email, password: `wrong-guess-${i}` }),
    );
    guesses.splice(30, 0, app.post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD }));
    const answers = await Promise.all(guesses);
    const statuses = answers.map((r) => r.status);
    // 401 and 200 are answers to a compared password; everything else was refused before comparing.
    const compared = statuses.filter((s) => s === 401 || s === 200).length;
    expect(compared).toBeLessThanOrEqual(FREE_ATTEMPTS);
    expect(hashJobsCompleted() - before).toBeLessThanOrEqual(FREE_ATTEMPTS);
    expect(statuses.filter((s) => s === 429).length).toBeGreaterThanOrEqual(61 - FREE_ATTEMPTS);
    expect(statuses.every((s) => [200, 401, 429].includes(s))).toBe(true);
    for (const r of answers.filter((a) => a.status === 429)) {
      expect(['too_many_attempts', 'busy']).toContain(r.body.error.code);
      expect(Number(r.headers['retry-after'])).toBeGreaterThan(0);
    }
  }, 60_000);

  it('a correct password gives the address its free attempts back', async () => {
    const user = await buildUser();
    const app = await api();
    for (let i = 0; i < FREE_ATTEMPTS - 1; i++)
      expect((await app.post('/api/auth/sign-in').send({ email: user.email, password: 'wrong-guess' })).status).toBe(401);
    expect((await app.post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD })).status).toBe(200);
    for (let i = 0; i < FREE_ATTEMPTS - 1; i++)
      expect((await app.post('/api/auth/sign-in').send({ email: user.email, password: 'wrong-guess' })).status).toBe(401);
  });
});

describe('unknown addresses look like known ones (point 6)', () => {
  it('a password is compared (against a dummy hash) for an unknown address, as for a known one', async () => {
    const app = await api();
    const before = hashJobsCompleted();
    const res = await app.post('/api/auth/sign-in').send({ email: 'no-such-person@example.test', password: 'some-guess-1' });
    expect(res.status).toBe(401);
    // The dummy hash is made once (a hash job) and then compared (a second); later calls compare only.
    const afterFirst = hashJobsCompleted();
    expect(afterFirst - before).toBeGreaterThanOrEqual(1);
    await app.post('/api/auth/sign-in').send({ email: 'no-such-person-2@example.test', password: 'some-guess-2' });
    expect(hashJobsCompleted() - afterFirst).toBe(1);
  });

  it('an unknown address is locked after the same number of failures, with the same answer', async () => {
    const known = await buildUser();
    const app = await api();
    const answersFor = async (email: string) => {
      const out: Array<{ status: number; code: string }> = [];
      for (let i = 0; i <= FREE_ATTEMPTS; i++) {
        const r = await app.post('/api/auth/sign-in').send({ email, password: `guess-${i}` });
        out.push({ status: r.status, code: r.body.error.code });
      }
      return out;
    };
    const knownAnswers = await answersFor(known.email);
    const unknownAnswers = await answersFor('nobody-here@example.test');
    expect(unknownAnswers).toEqual(knownAnswers);
    expect(knownAnswers.at(-1)).toEqual({ status: 429, code: 'too_many_attempts' });
  });
});

describe('housekeeping', () => {
  it('attempt counts idle for a day and without a running lock are forgotten; fresh ones stay', async () => {
    const app = await api();
    await app.post('/api/auth/sign-in').send({ email: 'stale-guess@example.test', password: 'a-guess' });
    await app.post('/api/auth/sign-in').send({ email: 'fresh-guess@example.test', password: 'a-guess' });
    await getSequelize().query(
      "UPDATE sign_in_attempts SET updated_at = now() - interval '2 days' WHERE email = 'stale-guess@example.test'",
    );
    expect(await purgeOldSignInAttempts()).toBeGreaterThanOrEqual(1);
    const [rows] = await getSequelize().query("SELECT email FROM sign_in_attempts WHERE email LIKE '%-guess@example.test'");
    expect((rows as Array<{ email: string }>).map((r) => r.email)).toEqual(['fresh-guess@example.test']);
  });
});

describe('busy, not down (point 2)', () => {
  it('a full hashing queue refuses at once with 429 busy and Retry-After', async () => {
    const saved = { threads: config.passwordHashThreads, queue: config.passwordHashQueue };
    await closePasswordPool();
    setEnv('PASSWORD_HASH_THREADS', 1);
    setEnv('PASSWORD_HASH_QUEUE', 1);
    try {
      const jobs = Array.from({ length: 10 }, () =>
        runHashJob({ op: 'hash', password: 'a-slow-hash-here', cost: 10 }).then(
          () => 'done',
          (err: { status?: number; code?: string; options?: { retryAfterSeconds?: number } }) =>
            `${err.status} ${err.code} ${err.options?.retryAfterSeconds}`,
        ),
      );
      const results = await Promise.all(jobs);
      expect(results.filter((r) => r === 'done').length).toBe(2);
      expect(results.filter((r) => r === '429 busy 5').length).toBe(8);
    } finally {
      await closePasswordPool();
      setEnv('PASSWORD_HASH_THREADS', saved.threads);
      setEnv('PASSWORD_HASH_QUEUE', saved.queue);
    }
  }, 60_000);

  it('a sign-in the hashing threads cannot take in time is refused before its body is read or a session made', async () => {
    const saved = config.passwordHashMaxWaitMs;
    // No wait allowed, and every hashing thread taken by a sign-in in flight: the next one would wait.
    setEnv('PASSWORD_HASH_MAX_WAIT_MS', 0);
    const inFlight: SignInTicket[] = [];
    // Admitted until every thread is taken.
    for (let ticket = tryAdmitSignIn(); ticket; ticket = tryAdmitSignIn()) inFlight.push(ticket);
    try {
      expect(inFlight.length).toBeGreaterThan(0);
      const res = await supertest(await getTestApp())
        .post('/api/auth/sign-in')
        .set('Content-Type', 'application/json')
        .send('{"email": not json');
      // Malformed JSON would be a 400 had the body parser run.
      expect(res.status).toBe(429);
      expect(res.body.error.code).toBe('busy');
      expect(res.headers['retry-after']).toBe('5');
      expect(res.headers['cache-control']).toBe('no-store');
      expect(res.headers['set-cookie']).toBeUndefined();
      expect(res.headers['x-content-type-options']).toBe('nosniff');
      // The exact path is refused ahead of Express; another form of it by the app's own door, alike.
      const other = await supertest(await getTestApp())
        .post('/api/auth/sign-in?next=/pages')
        .set('Content-Type', 'application/json')
        .send('{"email": not json');
      expect([other.status, other.body.error.code, other.headers['retry-after']]).toEqual([429, 'busy', '5']);
      expect(other.headers['cache-control']).toBe('no-store');
      expect(other.headers['x-content-type-options']).toBe('nosniff');
    } finally {
      for (const ticket of inFlight) ticket.release();
      setEnv('PASSWORD_HASH_MAX_WAIT_MS', saved);
    }
  });

  it('a sign-in takes its place at the door: one still sending its body holds it, and the next is refused unread', async () => {
    // One hashing thread and no wait allowed: one sign-in in flight fills the queue.
    const saved = { wait: config.passwordHashMaxWaitMs, threads: config.passwordHashThreads };
    await closePasswordPool();
    setEnv('PASSWORD_HASH_THREADS', 1);
    setEnv('PASSWORD_HASH_MAX_WAIT_MS', 0);
    const server = http.createServer(await getTestApp()).listen(0, '127.0.0.1');
    await new Promise((resolve) => server.once('listening', resolve));
    const { port } = server.address() as AddressInfo;
    const post = (length: number) =>
      http.request({
        host: '127.0.0.1',
        port,
        method: 'POST',
        path: '/api/auth/sign-in',
        headers: { 'Content-Type': 'application/json', 'Content-Length': length },
      });
    const answer = (req: http.ClientRequest) =>
      new Promise<{ status: number; code: string }>((resolve, reject) => {
        req.once('error', reject);
        req.once('response', (res) => {
          let text = '';
          res.on('data', (chunk) => (text += chunk));
          res.on('end', () => resolve({ status: res.statusCode ?? 0, code: JSON.parse(text).error?.code ?? '' }));
        });
      });
    try {
      // The first sign-in sends half its body and waits: it is in the body parser, not yet at the route.
      const slow = post(40);
      const slowAnswer = answer(slow);
      slow.write('{"email": ');
      slow.flushHeaders();
      await vi.waitFor(() => expect(signInWouldWaitTooLong()).toBe(true), { timeout: 5_000 });
      // Malformed JSON would be a 400 had the body parser read it.
      const malformed = '{"email": not json';
      const next = post(malformed.length);
      const nextAnswer = answer(next);
      next.end(malformed);
      expect(await nextAnswer).toEqual({ status: 429, code: 'busy' });
      slow.end('not json at all, this'.padEnd(30, '.'));
      expect((await slowAnswer).status).toBe(400);
      // Its answer sent, the place is free again: the next malformed body is read (400).
      await vi.waitFor(() => expect(signInWouldWaitTooLong()).toBe(false), { timeout: 5_000 });
      const after = post(malformed.length);
      const afterAnswer = answer(after);
      after.end(malformed);
      expect(await afterAnswer).toEqual({ status: 400, code: 'malformed_json' });
    } finally {
      server.close();
      await closePasswordPool();
      setEnv('PASSWORD_HASH_THREADS', saved.threads);
      setEnv('PASSWORD_HASH_MAX_WAIT_MS', saved.wait);
    }
  });

  it('admitted sign-ins take turns, hashing threads + 1 at a time; one that leaves while waiting never runs', async () => {
    const saved = { wait: config.passwordHashMaxWaitMs, threads: config.passwordHashThreads };
    await closePasswordPool();
    setEnv('PASSWORD_HASH_THREADS', 1);
    setEnv('PASSWORD_HASH_MAX_WAIT_MS', 60_000);
    const tickets: SignInTicket[] = [];
    try {
      const started: number[] = [];
      for (let i = 0; i < 4; i++) {
        const ticket = tryAdmitSignIn();
        expect(ticket).toBeDefined();
        tickets.push(ticket!);
        ticket!.whenItsTurn(() => started.push(i));
      }
      // One thread: two run (one hashing, one getting ready), two wait in arrival order.
      expect(started).toEqual([0, 1]);
      tickets[2].release(); // its connection dropped while it waited
      tickets[0].release();
      expect(started).toEqual([0, 1, 3]);
      tickets[1].release();
      tickets[3].release();
      expect(started).toEqual([0, 1, 3]);
      // Every place given back: a new sign-in runs at once.
      const next = tryAdmitSignIn()!;
      tickets.push(next);
      next.whenItsTurn(() => started.push(4));
      expect(started).toEqual([0, 1, 3, 4]);
    } finally {
      for (const ticket of tickets) ticket.release();
      await closePasswordPool();
      setEnv('PASSWORD_HASH_THREADS', saved.threads);
      setEnv('PASSWORD_HASH_MAX_WAIT_MS', saved.wait);
    }
  });

  it.skipIf(process.platform !== 'linux')(
    'hashing threads run at a lower priority than the thread that answers requests (Linux)',
    async () => {
      await runHashJob({ op: 'hash', password: 'a-priority-check', cost: 4 });
      const niceOf = (task: string) => {
        // Field 19 of /proc/<pid>/task/<tid>/stat is the nice value (fields counted after the command's ")").
        const stat = fs.readFileSync(`/proc/self/task/${task}/stat`, 'utf8');
        return Number(stat.slice(stat.lastIndexOf(')') + 2).split(' ')[16]);
      };
      const main = niceOf(String(process.pid));
      const nices = fs.readdirSync('/proc/self/task').map(niceOf);
      // A thread may only be lowered: under a test runner already at nice 10 or more there is nothing to see.
      expect(nices.some((nice) => nice > main)).toBe(main < 10);
    },
  );

  it('a lone sign-in is never refused as busy, however slow hashing has been: a thread is free', async () => {
    // One hashing thread (as on a 2-core machine) and no wait allowed: still admitted.
    const saved = { wait: config.passwordHashMaxWaitMs, threads: config.passwordHashThreads };
    await closePasswordPool();
    setEnv('PASSWORD_HASH_THREADS', 1);
    setEnv('PASSWORD_HASH_MAX_WAIT_MS', 0);
    try {
      const user = await buildUser();
      const res = await supertest(await getTestApp())
        .post('/api/auth/sign-in')
        .send({ email: user.email, password: TEST_PASSWORD });
      expect(res.status, JSON.stringify(res.body)).toBe(200);
    } finally {
      await closePasswordPool();
      setEnv('PASSWORD_HASH_THREADS', saved.threads);
      setEnv('PASSWORD_HASH_MAX_WAIT_MS', saved.wait);
    }
  });

  it('when every pooled connection is taken, a request answers 503 busy (not database_unavailable) with Retry-After', async () => {
    const user = await buildUser();
    const agent = supertest.agent(await getTestApp());
    expect((await agent.post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD })).status).toBe(200);
    const manager = getSequelize().connectionManager as unknown as {
      getConnection(): Promise<unknown>;
      releaseConnection(c: unknown): Promise<void>;
    };
    const max = getSequelize().config.pool?.max ?? 10;
    const held = await Promise.all(Array.from({ length: max }, () => manager.getConnection()));
    try {
      const res = await agent.get('/api/pages');
      expect(res.status).toBe(503);
      expect(res.body.error.code).toBe('busy');
      expect(Number(res.headers['retry-after'])).toBeGreaterThan(0);
    } finally {
      await Promise.all(held.map((c) => manager.releaseConnection(c)));
    }
    expect((await agent.get('/api/pages')).status).toBe(200);
  }, 30_000);
});

describe('password reset links (point 7)', () => {
  it('a password change revokes a reset link mailed earlier', async () => {
    const user = await buildUser();
    const app = await api();
    await app.post('/api/auth/password-reset').send({ email: user.email });
    const token = tokenFromMail(await waitForMail(user.email));
    const agent = supertest.agent(await getTestApp());
    await agent.post('/api/auth/sign-in').send({ email: user.email, password: TEST_PASSWORD });
    expect(
      (await agent.post('/api/auth/password').send({ currentPassword: TEST_PASSWORD, newPassword: 'a-fresh-long-phrase' }))
        .status,
    ).toBe(204);
    const late = await app.post('/api/auth/password-reset/complete').send({ token, newPassword: 'the-attackers-choice' });
    expect(late.status).toBe(400);
    expect(late.body.error.code).toBe('invalid_token');
  });

  it('at most 3 reset mails an hour per account, the answer unchanged; a second request leaves the first link working', async () => {
    const user = await buildUser();
    const app = await api();
    const answers = [];
    for (let i = 0; i < 5; i++) {
      const res = await app
        .post('/api/auth/password-reset')
        .set('X-Forwarded-For', `198.51.100.${i + 1}`)
        .send({ email: user.email });
      answers.push(res.status);
    }
    expect(answers).toEqual([202, 202, 202, 202, 202]);
    await waitForMail(user.email);
    await new Promise((r) => setTimeout(r, 500));
    const mails = await OutboxMessage.findAll({ where: { toAddresses: user.email }, order: [['receivedAt', 'ASC']] });
    expect(mails.length).toBe(3);
    // The first link still works although two more were mailed after it.
    const first = tokenFromMail(mails[0]);
    const done = await app.post('/api/auth/password-reset/complete').send({ token: first, newPassword: 'lantern-over-the-dome' });
    expect(done.status).toBe(200);
    // …and using it revokes the others.
    const second = tokenFromMail(mails[1]);
    expect(
      (await app.post('/api/auth/password-reset/complete').send({ token: second, newPassword: 'another-long-phrase' })).status,
    ).toBe(400);
  });
});
