import supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { appBaseUrl } from '../../server/config.ts';
import { KioskScreen, OutboxMessage } from '../../server/models/index.ts';
import { reportSilentScreens } from '../../server/services/publishing/index.ts';
import { getTestApp } from '../support/app.ts';
import { freshPublishingDesk, getFeed, pairedScreen, publishedPage, type PublishingDesk } from '../support/publishing.ts';

let crew: PublishingDesk['crew'];
let venue: PublishingDesk['venue'];
let channelWithScreen: PublishingDesk['channelWithScreen'];

beforeAll(async () => {
  ({ crew, venue, channelWithScreen } = await freshPublishingDesk('Smarter Screens Dome'));
});

const heartbeat = async (token: string, body: object) =>
  supertest(await getTestApp())
    .post('/api/kiosk/heartbeat')
    .set('Authorization', `Bearer ${token}`)
    .send(body);

describe('slide schedules', () => {
  it('stores a sunset-relative schedule, describes it, and sends it with the venue’s sunrises and sunsets', async () => {
    const { channelId, token } = await channelWithScreen('Evening', 'Evening screen');
    const schedule = { days: ['fri', 'sat'], from: { at: 'sunset', offsetMin: -60 }, until: { at: 'clock', time: '23:00' } };
    const res = await crew.editor.agent.post(`/api/channels/${channelId}/slides`).send({ kind: 'sky_tonight', schedule });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const slide = res.body.data.slides[0];
    expect(slide.schedule).toEqual({ ...schedule, firstDate: null, lastDate: null });
    expect(slide.scheduleText).toBe('Fri, Sat, from 1 h before sunset until 23:00');
    expect(['showing', 'off_schedule']).toContain(slide.state);

    const feed = JSON.parse((await getFeed(token)).text);
    expect(feed.items[0]._starproof.slide.schedule).toEqual(slide.schedule);
    const days = feed._starproof.sun_days as Array<{ date: string; sunrise: string; sunset: string }>;
    expect(days).toHaveLength(8);
    // Consecutive local dates, each sunset after its sunrise at 54.6° N (no polar days there).
    for (let i = 1; i < days.length; i += 1) expect(Date.parse(days[i].date) - Date.parse(days[i - 1].date)).toBe(86_400_000);
    for (const d of days) expect(Date.parse(d.sunset)).toBeGreaterThan(Date.parse(d.sunrise));

    // A clock-only schedule needs no Sun: the feed leaves the days out; null clears the schedule.
    const patched = await crew.editor.agent
      .patch(`/api/channels/${channelId}/slides/${slide.id}`)
      .send({ schedule: { from: { at: 'clock', time: '09:00' }, until: { at: 'clock', time: '17:00' } } });
    expect(patched.status).toBe(200);
    expect(patched.body.data.slides[0].scheduleText).toBe('every day, from 09:00 until 17:00');
    expect(JSON.parse((await getFeed(token)).text)._starproof.sun_days).toBeUndefined();
    const cleared = await crew.editor.agent.patch(`/api/channels/${channelId}/slides/${slide.id}`).send({ schedule: null });
    expect(cleared.body.data.slides[0]).toMatchObject({ schedule: null, scheduleText: 'Always', state: 'showing' });
  });

  it('refuses hostile schedules with a message per field', async () => {
    const { channelId } = await channelWithScreen('Hostile', 'Hostile screen');
    const cases: Array<[object, string, RegExp]> = [
      [{ firstDate: '2027-05-10', lastDate: '2027-05-01' }, 'schedule.lastDate', /on or after the first day/],
      [{ days: ['mon', 'caturday'] }, 'schedule.days.1', /Days are mon, tue/],
      [{ days: [] }, 'schedule.days', /at least one day/],
      [{ from: { at: 'sunset', offsetMin: -1000 } }, 'schedule.from.offsetMin', /at most 6 hours/],
      [{ from: { at: 'sunrise', offsetMin: 'soon' } }, 'schedule.from.offsetMin', /whole number of minutes/],
      [{ until: { at: 'clock', time: '7pm' } }, 'schedule.until.time', /HH:MM/],
      // Mon 3 – Tue 4 May 2027 holds no weekend day.
      [{ days: ['sat', 'sun'], firstDate: '2027-05-03', lastDate: '2027-05-04' }, 'schedule.days', /would never show/],
      [{ from: { at: 'clock', time: '10:00' }, until: { at: 'clock', time: '10:00' } }, 'schedule.until', /would last no time/],
    ];
    for (const [schedule, field, message] of cases) {
      const res = await crew.editor.agent.post(`/api/channels/${channelId}/slides`).send({ kind: 'sky_tonight', schedule });
      expect(res.status, JSON.stringify(schedule)).toBe(400);
      expect(res.body.error.code).toBe('invalid_input');
      expect(res.body.error.fields[field], JSON.stringify(res.body.error.fields)).toMatch(message);
    }
    // A start–end window wholly before the schedule's first day could never show either.
    const apart = await crew.editor.agent.post(`/api/channels/${channelId}/slides`).send({
      kind: 'sky_tonight',
      startsAt: '2027-01-01T18:00:00Z',
      endsAt: '2027-01-31T18:00:00Z',
      schedule: { firstDate: '2027-03-01', lastDate: '2027-03-31' },
    });
    expect(apart.status).toBe(400);
    expect(apart.body.error.fields['schedule.firstDate']).toMatch(
      /outside the schedule’s first and last days: it would never show/,
    );
    const channel = await crew.editor.agent.get(`/api/channels/${channelId}`);
    expect(channel.body.data.slides).toEqual([]); // nothing half-written
  });
});

describe('QR codes on object slides', () => {
  it('link to the page’s public address, and the channel can hide them', async () => {
    const page = await publishedPage(crew, 'Quasar with a code');
    const { channelId, token } = await channelWithScreen('Codes', 'Codes screen');
    await crew.editor.agent.post(`/api/channels/${channelId}/slides`).send({ kind: 'page', pageId: page.pageId });
    const feed = JSON.parse((await getFeed(token)).text);
    const qr = feed.items[0]._starproof.slide.qr;
    expect(qr.url).toBe(`${appBaseUrl()}/explore/quasar-with-a-code`);
    // QR version 4 is 33 modules, and each version adds 4 (ISO/IEC 18004); the path only draws unit runs.
    expect((qr.size - 17) % 4).toBe(0);
    expect(qr.path).toMatch(/^(M\d+ \d+h\d+v1h-\d+z)+$/);

    const hidden = await crew.editor.agent.patch(`/api/channels/${channelId}`).send({ showQr: false });
    expect(hidden.status).toBe(200);
    expect(hidden.body.data.showQr).toBe(false);
    expect(JSON.parse((await getFeed(token)).text).items[0]._starproof.slide.qr).toBeUndefined();
    const bad = await crew.editor.agent.patch(`/api/channels/${channelId}`).send({ showQr: 'no' });
    expect(bad.status).toBe(400);
    expect(bad.body.error.fields.showQr).toBe('showQr is true or false');
    const nothing = await crew.editor.agent.patch(`/api/channels/${channelId}`).send({});
    expect(nothing.status).toBe(400);
  });
});

describe('screen health', () => {
  it('records what a screen shows, its player and orientation; refuses hostile heartbeat fields', async () => {
    const { screenId, token } = await pairedScreen(crew.admin.agent, venue.id, 'Health screen');
    const slideId = '6f1d1c5e-9a43-4d7e-8f33-0a1b2c3d4e5f';
    const ok = await heartbeat(token, {
      playerVersion: 'starproof-player 1.1',
      slideId,
      slideTitle: 'The sky tonight',
      orientation: 'portrait',
    });
    expect(ok.status).toBe(200);
    expect(ok.body.data.orientation).toBe('auto');
    const list = await crew.admin.agent.get(`/api/venues/${venue.id}/screens`);
    expect(list.body.data.find((s: { id: string }) => s.id === screenId)).toMatchObject({
      health: 'online',
      playerVersion: 'starproof-player 1.1',
      showingSlide: { id: slideId, title: 'The sky tonight' },
      reportedOrientation: 'portrait',
      orientation: 'auto',
    });
    const hostile: Array<[object, string, RegExp]> = [
      [{ slideId: 'not-a-slide' }, 'slideId', /slide’s id/],
      [{ slideId: 42 }, 'slideId', /slide’s id/],
      [{ slideTitle: 'x'.repeat(201) }, 'slideTitle', /at most 200 characters/],
      [{ slideTitle: { html: '<b>' } }, 'slideTitle', /as text/],
      [{ orientation: 'sideways' }, 'orientation', /landscape or portrait/],
      [{ playerVersion: 'v'.repeat(41) }, 'playerVersion', /at most 40/],
    ];
    for (const [body, field, message] of hostile) {
      const res = await heartbeat(token, body);
      expect(res.status, JSON.stringify(body)).toBe(400);
      expect(res.body.error.fields[field]).toMatch(message);
    }
    expect((await KioskScreen.findByPk(screenId))!.showingSlideTitle).toBe('The sky tonight');

    // An admin turns the screen to portrait; the player learns it from its next heartbeat.
    const set = await crew.admin.agent.patch(`/api/venues/${venue.id}/screens/${screenId}`).send({ orientation: 'portrait' });
    expect(set.status).toBe(200);
    expect(set.body.data.orientation).toBe('portrait');
    expect((await heartbeat(token, {})).body.data.orientation).toBe('portrait');
    const wrong = await crew.admin.agent
      .patch(`/api/venues/${venue.id}/screens/${screenId}`)
      .send({ orientation: 'upside-down' });
    expect(wrong.status).toBe(400);
    expect(wrong.body.error.fields.orientation).toBe('The orientation is auto, landscape or portrait');
    expect(
      (await crew.editor.agent.patch(`/api/venues/${venue.id}/screens/${screenId}`).send({ orientation: 'auto' })).status,
    ).toBe(403);
  });

  it('e-mails admins once per outage when a screen is silent for the channel’s time, and notes its return', async () => {
    const { channelId, screenId, token } = await channelWithScreen('Watched', 'Watched screen');
    for (const [value, message] of [
      [2, /at least 5 minutes/],
      [20_000, /at most 10080 minutes/],
      [7.5, /whole minutes/],
    ] as const) {
      const res = await crew.editor.agent.patch(`/api/channels/${channelId}`).send({ silenceAlertMinutes: value });
      expect(res.status).toBe(400);
      expect(res.body.error.fields.silenceAlertMinutes).toMatch(message);
    }
    const set = await crew.editor.agent.patch(`/api/channels/${channelId}`).send({ silenceAlertMinutes: 10 });
    expect(set.body.data.silenceAlertMinutes).toBe(10);
    expect((await heartbeat(token, { slideTitle: 'Andromeda' })).status).toBe(200);
    await OutboxMessage.destroy({ where: {} });
    const admin = crew.admin.user.email;
    const inbox = () => OutboxMessage.findAll({ where: { toAddresses: admin }, order: [['receivedAt', 'ASC']] });
    const waitFor = async (n: number) => {
      for (let i = 0; i < 100 && (await inbox()).length < n; i += 1) await new Promise((r) => setTimeout(r, 50));
      return inbox();
    };

    expect(await reportSilentScreens(Date.now() + 9 * 60_000)).toBe(0); // not yet 10 minutes
    expect(await reportSilentScreens(Date.now() + 11 * 60_000)).toBe(1);
    const [silent] = await waitFor(1);
    expect(silent.subject).toBe('Screen silent: Watched screen at Smarter Screens Dome');
    expect(silent.textBody).toMatch(/has not been heard from for over 10 minutes/);
    expect(silent.textBody).toMatch(/It was last showing: Andromeda\./);
    // The next minutes' checks send nothing more for the same outage.
    expect(await reportSilentScreens(Date.now() + 12 * 60_000)).toBe(0);
    expect(await reportSilentScreens(Date.now() + 60 * 60_000)).toBe(0);
    expect((await KioskScreen.findByPk(screenId))!.silenceAlertedAt).not.toBeNull();

    // Back: the mark is cleared and admins get a short note; a later outage is reported again.
    expect((await heartbeat(token, {})).status).toBe(200);
    const mails = await waitFor(2);
    expect(mails.map((m) => m.subject)).toEqual([
      'Screen silent: Watched screen at Smarter Screens Dome',
      'Screen back: Watched screen at Smarter Screens Dome',
    ]);
    expect((await KioskScreen.findByPk(screenId))!.silenceAlertedAt).toBeNull();
    expect(await reportSilentScreens(Date.now() + 11 * 60_000)).toBe(1);

    // A channel without the setting never reports; nor does a non-admin get the mail.
    expect(await OutboxMessage.count({ where: { toAddresses: crew.editor.user.email } })).toBe(0);
    await crew.editor.agent.patch(`/api/channels/${channelId}`).send({ silenceAlertMinutes: null });
    await heartbeat(token, {});
    expect(await reportSilentScreens(Date.now() + 24 * 60 * 60_000)).toBe(0);
  });
});
