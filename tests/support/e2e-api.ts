import type { BrowserContext } from 'playwright-core';
import { DEMO_ACCOUNTS } from '../../server/demo/accounts.ts';

let addressCounter = 0;

/** A signed-in API session against the e2e server, from Node (no Origin header, as any non-browser client). */
export interface E2eSession {
  cookie: string;
  call<T = { data: unknown; error?: { code: string; message: string } }>(
    method: string,
    path: string,
    body?: unknown,
  ): Promise<{ status: number; body: T }>;
  upload(file: Buffer, fileName: string): Promise<{ status: number; body: { data: { id: string } } }>;
}

/**
 * Signs a demo account in through the API. Each session names its own test address in
 * X-Forwarded-For (the server trusts one loopback proxy hop), so these sign-ins do not use up the
 * per-address sign-in allowance the browser tests' form sign-ins share.
 */
export async function demoSession(baseUrl: string, role: 'admin' | 'editor' | 'reviewer' | 'writer'): Promise<E2eSession> {
  const account = DEMO_ACCOUNTS.find((a) => a.role === role)!;
  addressCounter += 1;
  const address = `198.18.${process.pid % 250}.${addressCounter}`;
  const res = await fetch(`${baseUrl}/api/auth/sign-in`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', 'X-Forwarded-For': address },
    body: JSON.stringify({ email: account.email, password: account.password }),
  });
  if (res.status !== 200) throw new Error(`sign-in as ${role}: ${res.status} ${await res.text()}`);
  const cookie = /starproof\.sid=[^;]+/.exec(res.headers.get('set-cookie') ?? '')![0];
  const call: E2eSession['call'] = async (method, path, body) => {
    const r = await fetch(`${baseUrl}${path}`, {
      method,
      headers: { Cookie: cookie, ...(body === undefined ? {} : { 'Content-Type': 'application/json' }) },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    const text = await r.text();
    return { status: r.status, body: text ? JSON.parse(text) : undefined } as never;
  };
  const upload: E2eSession['upload'] = async (file, fileName) => {
    const form = new FormData();
    form.append('file', new Blob([new Uint8Array(file)]), fileName);
    const r = await fetch(`${baseUrl}/api/media`, { method: 'POST', headers: { Cookie: cookie }, body: form });
    return { status: r.status, body: await r.json() };
  };
  return { cookie, call, upload };
}

/** Gives the browser the session's cookie, so it is signed in without using the sign-in form. */
export async function openSessionInBrowser(context: BrowserContext, baseUrl: string, session: E2eSession): Promise<void> {
  const [name, value] = session.cookie.split('=');
  await context.addCookies([{ name, value, url: baseUrl, httpOnly: true, sameSite: 'Lax' }]);
}

/** Throws with the answer when a set-up call did not succeed. */
export function ok<T extends { status: number; body: unknown }>(res: T, what: string): T {
  if (res.status >= 300) throw new Error(`${what}: ${res.status} ${JSON.stringify(res.body)}`);
  return res;
}

/**
 * Uploads a generated picture through the session, waits for its renditions and fills in what
 * publishing needs (alt text, credit, licence, source).
 * @returns the media id
 */
export async function readyImage(session: E2eSession, image: Buffer, credit: string, licenceId = 'cc-by-4.0'): Promise<string> {
  const id = ok(await session.upload(image, 'demo-picture.jpg'), 'upload').body.data.id;
  const deadline = Date.now() + 60_000;
  while (
    (await session.call<{ data: { renditionsStatus: string } }>('GET', `/api/media/${id}`)).body.data.renditionsStatus !== 'ready'
  ) {
    if (Date.now() > deadline) throw new Error(`renditions of ${id} not ready after 60 s`);
    await new Promise((r) => setTimeout(r, 300));
  }
  ok(
    await session.call('PATCH', `/api/media/${id}`, {
      altText: 'A dark blue field with a soft glow (demo picture)',
      credit,
      licenceId,
      sourceUrl: 'https://example.org/demo-picture',
    }),
    'image details',
  );
  return id;
}
