import { isShowingAt } from '@shared/schedule/evaluate.ts';
import type { FeedItem, KioskFeed } from '@shared/schemas/kiosk-feed.ts';
import { learnServerTime, serverNow } from './clock.ts';
import { h } from './dom.ts';
import { cacheFeedImages, feedImageUrls, fetchFeed, localImageUrl, releaseImagesExcept } from './feed-client.ts';
import { applyOrientation, currentOrientation } from './orientation.ts';
import { renderHolding, renderSlide } from './slides.ts';
import { loadSavedFeed, saveFeed, saveScreenOrientation } from './storage.ts';

/** Reported in every heartbeat; bump with player changes. */
export const PLAYER_VERSION = 'starproof-player 1.1';
const POLL_MS = 30_000;
const HEARTBEAT_MS = 45_000;
/** Cross-fade length: 1.5 s, within the 1–2 s the design allows; opacity only, never a flash. */
export const FADE_MS = 1500;
const OFFLINE_AFTER_MS = 90_000;

export interface PlayerOptions {
  feedUrl: string;
  token: string | null;
  /** Staff preview: no heartbeat, nothing saved. */
  preview: boolean;
  venueName: string;
  screenId: string | null;
  onUnpaired: () => void;
}

const inWindow = (item: FeedItem, now: number) => {
  const s = item._starproof.slide;
  return (!s.starts_at || Date.parse(s.starts_at) <= now) && (!s.ends_at || Date.parse(s.ends_at) > now);
};

const UUID = /^[0-9a-f]{8}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{4}-[0-9a-f]{12}$/i;

/** Plays a channel's feed full screen: cross-fades slide to slide, revalidates the feed, keeps playing offline. */
export class Player {
  private feed: KioskFeed | null = null;
  private etag: string | null = null;
  private current: { id: string; layer: HTMLElement } | null = null;
  private slideTimer = 0;
  private timers: number[] = [];
  private lastContact = Date.now();
  private readonly status = h('p', { class: 'status', role: 'status' });
  private readonly uhd = window.screen.width * window.devicePixelRatio > 2400;
  private stopped = false;

  constructor(
    private readonly root: HTMLElement,
    private readonly options: PlayerOptions,
  ) {}

  /** Shows the saved feed at once (if any), then keeps it fresh. */
  start(): void {
    this.root.replaceChildren(this.status);
    const saved = this.options.preview ? null : loadSavedFeed();
    if (saved) {
      this.feed = saved.feed;
      this.etag = saved.etag;
    }
    void this.next();
    void this.poll();
    this.timers.push(window.setInterval(() => void this.poll(), POLL_MS));
    if (!this.options.preview) {
      this.timers.push(window.setInterval(() => void this.heartbeat(), HEARTBEAT_MS));
      window.setTimeout(() => void this.heartbeat(), 3000);
    }
  }

  /** Stops every timer (before showing the pairing form). */
  stop(): void {
    this.stopped = true;
    window.clearTimeout(this.slideTimer);
    for (const t of this.timers) window.clearInterval(t);
  }

  /**
   * The slides to play now: inside their window and on their schedule, both by the server's clock
   * as last learnt (so a screen offline for days still follows the venue's days and evenings).
   */
  private playable(): FeedItem[] {
    const now = serverNow();
    const feed = this.feed;
    if (!feed) return [];
    const timeZone = feed._starproof.venue.time_zone;
    const sunDays = feed._starproof.sun_days ?? [];
    return feed.items.filter((i) => inWindow(i, now) && isShowingAt(i._starproof.slide.schedule, now, timeZone, sunDays));
  }

  private async poll(): Promise<void> {
    const answer = await fetchFeed(this.options.feedUrl, this.options.token, this.etag);
    if (this.stopped) return;
    if (answer.kind === 'unpaired') return this.unpaired();
    if (answer.kind !== 'unreachable') this.lastContact = Date.now();
    if (answer.kind === 'fresh') {
      const urls = feedImageUrls(answer.feed, this.uhd);
      // Play a new feed only once its images are here, so an outage can never catch it half loaded.
      if (!this.options.preview && !(await cacheFeedImages(urls))) return this.showStatus();
      this.feed = answer.feed;
      this.etag = answer.etag;
      if (!this.options.preview) saveFeed(answer.feed, answer.etag);
      releaseImagesExcept(urls);
      // The slide on screen was withdrawn (e.g. its page unpublished), or nothing was showing: move on now.
      const ids = new Set(this.playable().map((i) => i.id));
      if (!this.current || !ids.has(this.current.id)) void this.next();
    }
    this.showStatus();
  }

  private showStatus(): void {
    const offline = !this.options.preview && Date.now() - this.lastContact > OFFLINE_AFTER_MS;
    this.status.textContent = offline ? 'Offline · showing saved slides' : '';
  }

  private async heartbeat(): Promise<void> {
    try {
      const res = await fetch('/api/kiosk/heartbeat', {
        method: 'POST',
        headers: { Authorization: `Bearer ${this.options.token}`, 'Content-Type': 'application/json' },
        body: JSON.stringify({
          playerVersion: PLAYER_VERSION,
          screenId: this.options.screenId ?? undefined,
          slideId: this.current && UUID.test(this.current.id) ? this.current.id : null,
          slideTitle: (this.current?.layer.getAttribute('aria-label') ?? 'Holding screen').slice(0, 200),
          orientation: currentOrientation(),
          showing: {
            slideId: this.current?.id ?? null,
            title: this.current?.layer.getAttribute('aria-label') ?? 'Holding screen',
            language: this.current?.layer.getAttribute('lang') ?? null,
            feedEtag: this.etag,
            offline: Date.now() - this.lastContact > OFFLINE_AFTER_MS,
          },
        }),
      });
      if (res.status === 401) return this.unpaired();
      if (res.ok) {
        this.lastContact = Date.now();
        const data = ((await res.json()) as { data?: { serverTime?: string; orientation?: string } }).data;
        learnServerTime(data?.serverTime);
        // How the admin set the screen to hang; kept for a restart while offline.
        if (data?.orientation && saveScreenOrientation(data.orientation)) applyOrientation();
      }
    } catch {
      // Offline: the next heartbeat tries again.
    }
    this.showStatus();
  }

  private unpaired(): void {
    this.stop();
    this.options.onUnpaired();
  }

  /** Shows the slide after the current one (or the holding screen), then waits its duration. */
  private async next(): Promise<void> {
    window.clearTimeout(this.slideTimer);
    if (this.stopped) return;
    const items = this.playable();
    const at = this.current ? items.findIndex((i) => i.id === this.current!.id) : -1;
    const item = items.length ? items[(at + 1) % items.length] : null;
    const timeZone = this.feed?._starproof.venue.time_zone ?? 'UTC';
    if (!item) {
      // "Connecting…" until a feed arrives, then the venue's calm holding screen.
      const holding = this.feed ? 'holding' : 'connecting';
      if (this.current?.id !== holding) {
        const note = this.feed ? 'More about tonight’s sky will appear here soon.' : 'Connecting…';
        this.swap(holding, renderHolding(this.feed?._starproof.venue.name ?? this.options.venueName, note));
      }
      this.slideTimer = window.setTimeout(() => void this.next(), 10_000);
      return;
    }
    if (item.id !== this.current?.id) {
      const image = item._starproof.slide.image;
      const src = image ? (this.options.preview ? image.hd : await localImageUrl(this.uhd ? image.uhd : image.hd)) : null;
      const layer = renderSlide(item, src, timeZone);
      await waitForImages(layer);
      if (this.stopped) return;
      this.swap(item.id, layer);
    }
    this.slideTimer = window.setTimeout(() => void this.next(), item._starproof.slide.duration_s * 1000);
  }

  private swap(id: string, layer: HTMLElement): void {
    const old = this.current?.layer;
    this.root.insertBefore(layer, this.status);
    // Next frame: the new layer starts transparent, so the opacity transition runs. The old layer
    // fades out in the same frame, so there is never a moment with no slide on screen.
    requestAnimationFrame(() =>
      requestAnimationFrame(() => {
        layer.classList.add('shown');
        if (old) {
          old.classList.remove('shown');
          window.setTimeout(() => old.remove(), FADE_MS + 100);
        }
      }),
    );
    this.current = { id, layer };
  }
}

/** Waits (at most 4 s) for a slide's image to be decoded, so it fades in whole, never half drawn. */
async function waitForImages(layer: HTMLElement): Promise<void> {
  const images = [...layer.querySelectorAll('img')];
  await Promise.race([
    Promise.all(images.map((img) => img.decode().catch(() => undefined))),
    new Promise((r) => window.setTimeout(r, 4000)),
  ]);
}
