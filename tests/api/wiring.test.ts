import type PgBoss from 'pg-boss';
import { beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/app.ts';
import { enqueue } from '../../server/jobs/queue.ts';
import { AuthToken } from '../../server/models/index.ts';
import { catalogueEvents } from '../../server/services/catalogue/events.ts';
import { publishingEvents } from '../../server/services/publishing/events.ts';
import { settingsEvents } from '../../server/services/settings/events.ts';
import { statementEvents } from '../../server/services/statements/events.ts';
import { TOKEN_PURGE_JOB } from '../../server/services/users/auth-tokens.ts';
import { startSchedules, wireServer } from '../../server/wiring.ts';
import { buildUser, getTestApp, resetDatabase, signedInAgent } from '../support/app.ts';
import { buildSkyObject, buildSource } from '../support/catalogue.ts';

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
});

const DAY = 86_400_000;

describe('the server wiring', () => {
  it('registers every listener once, however many apps are built', () => {
    const emitters = [catalogueEvents, statementEvents, publishingEvents, settingsEvents] as unknown as {
      eventNames(): (string | symbol)[];
      listenerCount(name: string | symbol): number;
    }[];
    const count = () => emitters.flatMap((e) => e.eventNames().map((n) => `${String(n)}:${e.listenerCount(n)}`));
    const before = count();
    expect(before.length).toBeGreaterThan(0);
    createApp();
    wireServer();
    expect(count()).toEqual(before);
  });

  it('editing or retiring a preferred measurement is one event, not two', async () => {
    const { agent } = await signedInAgent('reviewer');
    const object = await buildSkyObject();
    const source = await buildSource();
    const created = await agent
      .post(`/api/catalogue/objects/${object.id}/measurements`)
      .send({ quantity: 'redshift', value: 0.158, sourceId: source.id });
    const id = created.body.data.id as string;
    expect((await agent.put(`/api/catalogue/measurements/${id}/preferred`).send({ preferred: true })).status).toBe(200);
    const seen: string[] = [];
    const onMeasurement = () => seen.push('measurementChanged');
    const onPreferred = () => seen.push('preferredChanged');
    catalogueEvents.on('measurementChanged', onMeasurement);
    catalogueEvents.on('preferredChanged', onPreferred);
    try {
      const edited = await agent
        .patch(`/api/catalogue/measurements/${id}`)
        .send({ quantity: 'redshift', value: 0.1583, sourceId: source.id, reason: 'Corrected a typing error.' });
      expect(edited.status).toBe(200);
      expect(seen).toEqual(['measurementChanged']);
      const retired = await agent.delete(`/api/catalogue/measurements/${id}`).query({ reason: 'Superseded.' });
      expect(retired.status).toBe(200);
      expect(seen).toEqual(['measurementChanged', 'measurementChanged']);
    } finally {
      catalogueEvents.off('measurementChanged', onMeasurement);
      catalogueEvents.off('preferredChanged', onPreferred);
    }
  });

  it('a band change goes out as a settings event (whose listener recomputes), not as a direct call', async () => {
    const { agent } = await signedInAgent('admin');
    const band = (await agent.get('/api/settings')).body.data.defaultBand as string;
    const other = band === 'V' ? 'B' : 'V';
    const seen: number[] = [];
    const listener = ({ version }: { version: number }) => void seen.push(version);
    settingsEvents.on('statementDefaultsChanged', listener);
    try {
      const changed = await agent.patch('/api/settings').send({ defaultBand: other });
      expect(changed.status).toBe(200);
      expect(seen).toEqual([changed.body.data.version]);
      expect((await agent.patch('/api/settings').send({ defaultBand: other })).status).toBe(200);
      expect(seen).toHaveLength(1);
    } finally {
      settingsEvents.off('statementDefaultsChanged', listener);
      await agent.patch('/api/settings').send({ defaultBand: band });
    }
  });
});

describe('the expired sign-in link clean-up', () => {
  it('the daily job removes links expired over 30 days ago and keeps the rest', async () => {
    const user = await buildUser();
    const token = (hash: string, expiresAt: Date) =>
      AuthToken.create({ userId: user.id, purpose: 'invitation', tokenHash: hash.padEnd(64, '0'), expiresAt });
    const old = await token('a1', new Date(Date.now() - 31 * DAY));
    const recentlyExpired = await token('b2', new Date(Date.now() - 29 * DAY));
    const live = await token('c3', new Date(Date.now() + DAY));
    // No queue runs in API tests, so the job runs inline through the worker the wiring registered.
    await enqueue(TOKEN_PURGE_JOB, {});
    expect(await AuthToken.findByPk(old.id)).toBeNull();
    expect(await AuthToken.findByPk(recentlyExpired.id)).not.toBeNull();
    expect(await AuthToken.findByPk(live.id)).not.toBeNull();
  });

  it('is scheduled once a day with the other schedules', async () => {
    const scheduled: { name: string; cron: string }[] = [];
    const boss = {
      schedule: async (name: string, cron: string) => void scheduled.push({ name, cron }),
    } as unknown as PgBoss;
    await startSchedules(boss);
    const purge = scheduled.filter((s) => s.name === TOKEN_PURGE_JOB);
    expect(purge).toHaveLength(1);
    // minute, hour, then every day of every month, any weekday: once a day
    expect(purge[0].cron).toMatch(/^\d+ \d+ \* \* \*$/);
  });
});
