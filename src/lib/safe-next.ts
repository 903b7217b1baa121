/**
 * Where to go after sign-in: the `next` path when it names a page of this site, else the dashboard.
 * Browsers read `/\evil.example` as `//evil.example` (another site), and react-router throws on
 * some paths it cannot parse, so the path is resolved as the browser would resolve it and kept only
 * if it stays on this origin.
 * @param next the `next` search parameter, as typed into the address bar
 */
export function safeNext(next: string | null): string {
  if (!next?.startsWith('/') || next.includes('\\') || /[\u0000-\u001f\u007f]/.test(next)) return '/';
  const base = 'https://starproof.invalid';
  try {
    const url = new URL(next, base);
    if (url.origin !== base) return '/';
    return `${url.pathname}${url.search}${url.hash}`;
  } catch {
    return '/';
  }
}
