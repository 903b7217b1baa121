/**
 * The server's clock as the player knows it. A kiosk's own clock may be hours off; every answer's
 * HTTP Date header (a 304 too) and the feed's server_time say what time the server thinks it is,
 * and the player uses that for slide windows and dates.
 */
let offsetMs = 0;

/** Records the server's time from an answer received just now. */
export function learnServerTime(serverTime: string | null | undefined): void {
  const t = serverTime ? Date.parse(serverTime) : NaN;
  if (Number.isFinite(t)) offsetMs = t - Date.now();
}

/** Now, by the server's clock (epoch ms). */
export const serverNow = (): number => Date.now() + offsetMs;
