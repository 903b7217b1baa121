import supertest from 'supertest';
import { beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent, KioskScreen } from '../../server/models/index.ts';
import { appBaseUrl } from '../../server/config.ts';
import { getTestApp, resetDatabase, signedInAgent } from '../support/app.ts';

beforeAll(async () => {
  await getTestApp();
  await resetDatabase();
});

let venueCounter = 0;
async function venueWithScreen(agent: Awaited<ReturnType<typeof signedInAgent>>['agent'], screenName = 'Foyer') {
  venueCounter += 1;
  const venue = (
    await agent.post('/api/venues').send({
      name: `Kiosk Test Dome ${venueCounter}`,
      latitude: 51.5,
      longitude: -0.1,
      elevationM: 10,
      timeZone: 'Europe/London',
    })
  ).body.data;
  const added = await agent.post(`/api/venues/${venue.id}/screens`).send({ name: screenName });
  expect(added.status).toBe(201);
  return { venue, screen: added.body.data.screen, code: added.body.data.pairingCode as string };
}

const kiosk = async () => supertest(await getTestApp());
const pair = async (code: string) => (await kiosk()).post('/api/kiosk/pair').send({ code });
const heartbeat = async (token: string, body: object = {}) =>
  (await kiosk()).post('/api/kiosk/heartbeat').set('Authorization', `Bearer ${token}`).send(body);

describe('kiosk pairing and tokens', () => {
  it('the pairing answer carries the player’s absolute address and a QR code of it, drawn from a module grid', async () => {
    const { agent } = await signedInAgent('admin');
    const venue = (
      await agent
        .post('/api/venues')
        .send({ name: 'QR Test Dome', latitude: 51.5, longitude: -0.1, elevationM: 10, timeZone: 'Europe/London' })
    ).body.data;
    const added = await agent.post(`/api/venues/${venue.id}/screens`).send({ name: 'QR foyer' });
    expect(added.body.data.playerUrl).toBe(`${appBaseUrl()}/kiosk`);
    expect(added.body.data.playerUrl).toMatch(/^https?:\/\/[^/]+\/kiosk$/);
    const { size, path } = added.body.data.playerQr as { size: number; path: string };
    // A version 1–40 code is 21–177 modules wide (ISO/IEC 18004), plus 4 modules of quiet zone each side.
    expect((size - 8 - 21) % 4).toBe(0);
    expect(size).toBeGreaterThanOrEqual(29);
    // Only unit squares, and none in the quiet zone.
    const squares = [...path.matchAll(/M(\d+) (\d+)h1v1h-1z/g)];
    expect(squares.map((m) => m[0]).join('')).toBe(path);
    for (const [, x, y] of squares) {
      expect(Number(x)).toBeGreaterThanOrEqual(4);
      expect(Number(y)).toBeLessThan(size - 4);
    }
    // The three finder patterns: the top-left corner module of each is dark.
    const dark = new Set(squares.map(([, x, y]) => `${x},${y}`));
    for (const corner of ['4,4', `${size - 11},4`, `4,${size - 11}`]) expect(dark.has(corner), corner).toBe(true);
    const repaired = await agent.post(`/api/venues/${venue.id}/screens/${added.body.data.screen.id}/pairing`);
    expect(repaired.body.data.playerUrl).toBe(added.body.data.playerUrl);
  });

  it('an admin adds a screen and sees a one-time code like K7Q-4M2; the player trades it for a token', async () => {
    const { agent } = await signedInAgent('admin');
    const { venue, screen, code } = await venueWithScreen(agent);
    expect(code).toMatch(/^[A-HJKMNP-Z2-9]{3}-[A-HJKMNP-Z2-9]{3}$/);
    expect(screen.health).toBe('awaiting-pairing');
    // Stored hashed: the code is nowhere in the row.
    const row = await KioskScreen.findByPk(screen.id);
    expect(JSON.stringify(row!.toJSON())).not.toContain(code.replace('-', ''));

    const paired = await pair(code.toLowerCase().replace('-', ' '));
    expect(paired.status).toBe(201);
    expect(paired.body.data.screen).toMatchObject({ id: screen.id, venueId: venue.id });
    const token = paired.body.data.token as string;
    expect(token.length).toBeGreaterThan(40);
    expect((await KioskScreen.findByPk(screen.id))!.tokenHash).not.toBe(token);

    const beat = await heartbeat(token, { playerVersion: '1.0.0', showing: { slide: 'sky-tonight' } });
    expect(beat.status).toBe(200);
    expect(beat.body.data).toMatchObject({ screenId: screen.id, venueId: venue.id });
    expect(Date.parse(beat.body.data.serverTime)).not.toBeNaN();
    const list = await agent.get(`/api/venues/${venue.id}/screens`);
    expect(list.body.data[0]).toMatchObject({ health: 'online', playerVersion: '1.0.0', showing: { slide: 'sky-tonight' } });
    expect(JSON.stringify(list.body.data)).not.toMatch(/tokenHash|pairingCodeHash/);
    expect(await AuditEvent.count({ where: { action: 'kiosk.paired', subjectId: screen.id } })).toBe(1);
  });

  it('a pairing code works once: reusing it is a clear 400', async () => {
    const { agent } = await signedInAgent('admin');
    const { code } = await venueWithScreen(agent);
    expect((await pair(code)).status).toBe(201);
    const again = await pair(code);
    expect(again.status).toBe(400);
    expect(again.body.error).toMatchObject({ code: 'pairing_code_used' });
    expect(again.body.error.message).toMatch(/already been used/);
  });

  it('an expired code is a clear 400 and issues no token', async () => {
    const { agent } = await signedInAgent('admin');
    const { screen, code } = await venueWithScreen(agent);
    await KioskScreen.update({ pairingExpiresAt: new Date(Date.now() - 1000) }, { where: { id: screen.id } });
    const res = await pair(code);
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('pairing_code_expired');
    expect(res.body.error.message).toMatch(/15 minutes/);
    expect((await KioskScreen.findByPk(screen.id))!.tokenHash).toBeNull();
  });

  it('an unknown or malformed code is a clear 400', async () => {
    const unknown = await pair('ZZZ-ZZZ');
    expect(unknown.status).toBe(400);
    expect(unknown.body.error.code).toBe('pairing_code_unknown');
    const malformed = await pair('12');
    expect(malformed.status).toBe(400);
    expect(malformed.body.error.fields.code).toMatch(/six letters and digits/);
  });

  it('unknown, missing and revoked tokens get 401 kiosk_token_invalid', async () => {
    const { agent } = await signedInAgent('admin');
    const { venue, screen, code } = await venueWithScreen(agent);
    const token = (await pair(code)).body.data.token as string;
    const unknown = await heartbeat('spk_this-is-not-a-real-token-at-all');
    expect(unknown.status).toBe(401);
    expect(unknown.body.error.code).toBe('kiosk_token_invalid');
    expect(unknown.headers['www-authenticate']).toMatch(/Bearer/);
    const missing = await (await kiosk()).post('/api/kiosk/heartbeat').send({});
    expect(missing.status).toBe(401);
    expect(missing.body.error.code).toBe('kiosk_token_invalid');

    const revoked = await agent.post(`/api/venues/${venue.id}/screens/${screen.id}/revoke`);
    expect(revoked.status).toBe(200);
    expect(revoked.body.data.health).toBe('revoked');
    const after = await heartbeat(token);
    expect(after.status).toBe(401);
    expect(after.body.error.code).toBe('kiosk_token_invalid');
    expect((await (await kiosk()).get(`/api/kiosk/venues/${venue.id}/sky`).set('Authorization', `Bearer ${token}`)).status).toBe(
      401,
    );
  });

  it('re-pairing gives a new code; the old token works until the new code is used, then stops', async () => {
    const { agent } = await signedInAgent('admin');
    const { venue, screen, code } = await venueWithScreen(agent);
    const first = (await pair(code)).body.data.token as string;
    const repair = await agent.post(`/api/venues/${venue.id}/screens/${screen.id}/pairing`);
    expect(repair.status).toBe(201);
    expect(repair.body.data.pairingCode).not.toBe(code);
    expect((await heartbeat(first)).status).toBe(200);
    const second = (await pair(repair.body.data.pairingCode)).body.data.token as string;
    expect((await heartbeat(second)).status).toBe(200);
    expect((await heartbeat(first)).status).toBe(401);
  });

  it('a kiosk token acts only for its own screen and venue', async () => {
    const { agent } = await signedInAgent('admin');
    const a = await venueWithScreen(agent, 'Screen A');
    const b = await venueWithScreen(agent, 'Screen B');
    const tokenA = (await pair(a.code)).body.data.token as string;
    const own = await (await kiosk()).get(`/api/kiosk/venues/${a.venue.id}/sky`).set('Authorization', `Bearer ${tokenA}`);
    expect(own.status).toBe(200);
    expect(own.body.data.sky.planets).toHaveLength(7);
    const other = await (await kiosk()).get(`/api/kiosk/venues/${b.venue.id}/sky`).set('Authorization', `Bearer ${tokenA}`);
    expect(other.status).toBe(403);
    expect(other.body.error.code).toBe('kiosk_wrong_screen');
    const otherScreen = await heartbeat(tokenA, { screenId: b.screen.id, playerVersion: 'hijack' });
    expect(otherScreen.status).toBe(403);
    expect((await KioskScreen.findByPk(b.screen.id))!.playerVersion).toBeNull();
    // The admin routes do not accept a kiosk token either.
    expect((await (await kiosk()).get(`/api/venues/${a.venue.id}/screens`).set('Authorization', `Bearer ${tokenA}`)).status).toBe(
      401,
    );
  });

  it('an admin cannot reach another venue’s screen through this venue’s URL', async () => {
    const { agent } = await signedInAgent('admin');
    const a = await venueWithScreen(agent, 'Screen C');
    const b = await venueWithScreen(agent, 'Screen D');
    const res = await agent.post(`/api/venues/${a.venue.id}/screens/${b.screen.id}/revoke`);
    expect(res.status).toBe(404);
    expect((await KioskScreen.findByPk(b.screen.id))!.revokedAt).toBeNull();
  });

  it('a heartbeat with an oversized "showing" is refused with a clear message', async () => {
    const { agent } = await signedInAgent('admin');
    const { code } = await venueWithScreen(agent);
    const token = (await pair(code)).body.data.token as string;
    const res = await heartbeat(token, { showing: { text: 'x'.repeat(5000) } });
    expect(res.status).toBe(400);
    expect(res.body.error.fields.showing).toMatch(/at most 4000/);
  });

  it('a screen not seen for over two minutes shows as offline', async () => {
    const { agent } = await signedInAgent('admin');
    const { venue, screen, code } = await venueWithScreen(agent);
    await pair(code);
    await KioskScreen.update({ lastSeenAt: new Date(Date.now() - 3 * 60_000) }, { where: { id: screen.id } });
    const list = await agent.get(`/api/venues/${venue.id}/screens`);
    expect(list.body.data[0].health).toBe('offline');
  });

  it('refuses a duplicate screen name at one venue', async () => {
    const { agent } = await signedInAgent('admin');
    const { venue } = await venueWithScreen(agent, 'Planetarium Door');
    const res = await agent.post(`/api/venues/${venue.id}/screens`).send({ name: 'planetarium door' });
    expect(res.status).toBe(409);
    expect(res.body.error.code).toBe('screen_name_taken');
  });
});
