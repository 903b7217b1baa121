import sharp from 'sharp';

/** A signed-in staff session against a running server (e2e and benchmarks), through plain fetch. */
export class StaffClient {
  private constructor(
    readonly baseUrl: string,
    private readonly cookie: string,
  ) {}

  /** Signs in with a demo (or any) account. */
  static async signIn(baseUrl: string, email: string, password: string): Promise<StaffClient> {
    const res = await fetch(`${baseUrl}/api/auth/sign-in`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email, password }),
    });
    if (res.status !== 200) throw new Error(`sign-in failed: ${res.status} ${await res.text()}`);
    const cookie = (res.headers.get('set-cookie') ?? '').split(';')[0];
    return new StaffClient(baseUrl, cookie);
  }

  /** A JSON call; throws on any status of 300 or more, with the server's message. */
  async call<T = unknown>(method: string, path: string, body?: unknown): Promise<T> {
    const res = await fetch(`${this.baseUrl}/api${path}`, {
      method,
      headers: { Cookie: this.cookie, ...(body === undefined ? {} : { 'Content-Type': 'application/json' }) },
      body: body === undefined ? undefined : JSON.stringify(body),
    });
    const text = await res.text();
    if (res.status >= 300) throw new Error(`${method} ${path}: ${res.status} ${text}`);
    return (text ? (JSON.parse(text) as { data: T }).data : undefined) as T;
  }

  /**
   * Uploads a generated picture (a soft reddish glow on dark blue, like a nebula), waits for its
   * renditions and fills in what publishing needs.
   */
  async uploadReadyImage(credit: string, licenceId = 'cc-by-4.0'): Promise<string> {
    const svg = `<svg xmlns="http://www.w3.org/2000/svg" width="2400" height="1500"><defs>
      <radialGradient id="g" cx="62%" cy="45%" r="45%"><stop offset="0" stop-color="#f2a07b"/><stop offset="0.35" stop-color="#a8425a"/><stop offset="0.7" stop-color="#2b1d4a"/><stop offset="1" stop-color="#070b18"/></radialGradient></defs>
      <rect width="2400" height="1500" fill="#070b18"/><rect width="2400" height="1500" fill="url(#g)"/></svg>`;
    const png = await sharp(Buffer.from(svg)).png().toBuffer();
    const form = new FormData();
    form.append('file', new Blob([new Uint8Array(png)]), 'glow.png');
    const res = await fetch(`${this.baseUrl}/api/media`, { method: 'POST', headers: { Cookie: this.cookie }, body: form });
    if (res.status >= 300) throw new Error(`upload: ${res.status} ${await res.text()}`);
    const id = ((await res.json()) as { data: { id: string } }).data.id;
    const deadline = Date.now() + 60_000;
    for (;;) {
      const media = await this.call<{ renditionsStatus: string }>('GET', `/media/${id}`);
      if (media.renditionsStatus === 'ready') break;
      if (Date.now() > deadline) throw new Error(`renditions not ready: ${media.renditionsStatus}`);
      await new Promise((r) => setTimeout(r, 300));
    }
    await this.call('PATCH', `/media/${id}`, {
      altText: 'A soft red glow of gas against a dark blue sky (demo picture)',
      credit,
      licenceId,
      sourceUrl: 'https://example.org/demo-picture',
    });
    return id;
  }
}
