import type { SunDay } from '../schedule/evaluate.ts';
import type { SlideSchedule } from './slide-schedule.ts';

/**
 * The kiosk feed: JSON Feed 1.1 (https://jsonfeed.org/version/1.1) with our own extension objects,
 * named with a leading underscore as the specification asks (`_starproof`). Feed readers ignore
 * the extension; the player reads it for timing, layout, statements, credits and the sky table.
 */

export const JSON_FEED_VERSION = 'https://jsonfeed.org/version/1.1';
/** Bumped when the extension changes in a way an older player cannot read. */
export const FEED_EXTENSION_VERSION = 1;

/** How the player lays a slide out. */
export type SlideLayout = 'text' | 'image-text' | 'image' | 'sky-table';

/** Every address in the feed is absolute (PUBLIC_URL, or the CDN's): images and pages alike. */
export interface FeedImage {
  /** 16:9 rendition for 1920 × 1080 screens (JPEG, read by every device). */
  hd: string;
  /** 16:9 rendition for 3840 × 2160 screens; the HD one when the original is smaller. */
  uhd: string;
  /** The writer's focal point, 0–1 from the left and top (object-position for other aspect ratios). */
  focal: { x: number; y: number };
  alt: string;
}

export interface FeedStatement {
  id: string;
  /** The wording as signed off for publication. */
  text: string;
  /** Small print that qualifies it (which band, which cosmology, which night); the player shows it where space allows. */
  note?: string;
  /** When the statement's figure was last accepted (or computed), ISO 8601. */
  as_of: string;
}

/** The sky-tonight table, already in words and local times. */
export interface FeedSky {
  local_date: string;
  time_zone: string;
  venue_name: string;
  sunset: string;
  /** When it is fully dark, as a phrase: "fully dark from 18:05", "fully dark only just, from …", "no full darkness tonight". */
  dark_from: string;
  darkness: string;
  moon: { phase: string; illuminated_percent: number; rise: string; set: string };
  planets: Array<{
    name: string;
    up_after_dusk: boolean;
    rise: string;
    highest: string;
    set: string;
    direction: string;
    altitude_deg: number;
    distance: string;
    light_time: string;
    visibility: string;
  }>;
  computed_at: string;
}

/** A QR code to a page's public address: an SVG path in module units (quiet zone not included). */
export interface FeedQr {
  url: string;
  /** Modules per side. */
  size: number;
  /** SVG path data drawing the dark modules, in a size × size box. */
  path: string;
}

export interface FeedSlide {
  kind: 'page' | 'image' | 'sky_tonight';
  position: number;
  duration_s: number;
  starts_at: string | null;
  ends_at: string | null;
  layout: SlideLayout;
  /** Short text for the screen (a page's first paragraph, an image's caption). */
  text: string;
  statements: FeedStatement[];
  /** Always present with an image; null only when the slide has none. */
  credit: string | null;
  licence: string | null;
  licence_url: string | null;
  image: FeedImage | null;
  /** When the slide shows by the venue's clock; absent or null = always. The player evaluates it itself. */
  schedule?: SlideSchedule | null;
  /** Object slides: a QR code to the page's public address (absent when the channel hides it). */
  qr?: FeedQr;
}

export interface FeedItem {
  /** The slide's id; with languages to play, `<slide id>~<locale>` (one item per slide and language round). */
  id: string;
  /** A page slide's public page, absolute (`${PUBLIC_URL}/explore/<slug>`; JSON Feed's item `url`). */
  url?: string;
  title: string;
  /** JSON Feed 1.1: the item's language (a page slide's version; the sky table is English; an image has none). */
  language?: string;
  content_html: string;
  image?: string;
  date_published?: string;
  date_modified?: string;
  _starproof: { slide: FeedSlide; sky?: FeedSky };
}

export interface KioskFeed {
  version: typeof JSON_FEED_VERSION;
  title: string;
  description?: string;
  items: FeedItem[];
  _starproof: {
    version: number;
    /** The server's clock when this feed was built; the HTTP Date header gives it on every answer. */
    server_time: string;
    /** The feed is rebuilt by then at the latest (a slide's window opens or closes, or the night changes). */
    valid_until: string | null;
    channel: { id: string; name: string } | null;
    /**
     * The languages this screen plays, in order: the screen's own, else the channel's. Items come in
     * one round per language (a page slide in its version in that language, or as chosen when it has
     * none; image and sky slides in every round). Empty: one round, each page as chosen.
     */
    languages: string[];
    venue: { id: string; name: string; time_zone: string };
    /** True when nothing is to be shown: the player shows a calm holding screen. */
    holding: boolean;
    /**
     * Sunrise and sunset at the venue from yesterday for a week, local dates; present when a slide's
     * schedule is tied to the Sun. Beyond the last day the player keeps that day's local times.
     */
    sun_days?: SunDay[];
  };
}
