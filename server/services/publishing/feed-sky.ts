import type { FeedSky } from '@shared/schemas/kiosk-feed.ts';
import { clockText } from '@shared/sky/events.ts';
import type { SkyTonight } from '@shared/sky/types.ts';
import { escapeMarkup } from './feed-text.ts';

const oneDecimal = new Intl.NumberFormat('en-GB', { minimumFractionDigits: 1, maximumFractionDigits: 1 });
const whole = new Intl.NumberFormat('en-GB', { maximumFractionDigits: 0 });

/** "94.7 million km", "1.2 billion km" or "384,400 km". */
export function distanceText(km: number): string {
  if (km >= 1e9) return `${oneDecimal.format(km / 1e9)} billion km`;
  if (km >= 1e6) return `${oneDecimal.format(km / 1e6)} million km`;
  return `${whole.format(km)} km`;
}

/** "1.3 seconds", "5 min 16 s", "1 h 04 min". */
export function lightTimeText(seconds: number): string {
  if (seconds < 60) return `${oneDecimal.format(seconds)} s`;
  if (seconds < 3600) return `${Math.floor(seconds / 60)} min ${String(Math.round(seconds % 60)).padStart(2, '0')} s`;
  const minutes = Math.round(seconds / 60);
  return `${Math.floor(minutes / 60)} h ${String(minutes % 60).padStart(2, '0')} min`;
}

/**
 * When the sky is fully dark (astronomical twilight ends), as a phrase that stands on its own:
 * "fully dark from 18:05", "fully dark only just, from 00:41 tomorrow" (the Sun's lowest point within
 * 0.1° of −18°), or "no full darkness tonight".
 */
export function darkFrom(sky: SkyTonight): string {
  const dusk = sky.sun.astronomicalDusk;
  if (dusk.utc === null) return sky.sun.darkness.kind === 'dark-all-day' ? 'dark all day' : 'no full darkness tonight';
  const when = clockText(Date.parse(dusk.utc), sky.timeZone, sky.localDate);
  return dusk.state === 'grazes' ? `fully dark only just, from ${when}` : `fully dark from ${when}`;
}

/**
 * The sky tonight as a kiosk slide shows it: words and local times only, planets that are up after
 * dusk first (then the rest, marked), figures as the sky snapshot computed them.
 * @param sky the stored snapshot's data
 * @param computedAt when the snapshot was computed
 */
export function feedSky(sky: SkyTonight, computedAt: Date, venueName: string): FeedSky {
  const planets = [...sky.planets].sort((a, b) => Number(b.upAfterDusk) - Number(a.upAfterDusk));
  return {
    local_date: sky.localDate,
    time_zone: sky.timeZone,
    venue_name: venueName,
    sunset: sky.sun.sunset.text,
    dark_from: darkFrom(sky),
    darkness: sky.sun.darkness.text,
    moon: {
      phase: sky.moon.phaseName,
      illuminated_percent: Math.round(sky.moon.illuminatedFraction * 100),
      rise: sky.moon.times.rise.text,
      set: sky.moon.times.set.text,
    },
    planets: planets.map((p) => ({
      name: p.name,
      up_after_dusk: p.upAfterDusk,
      rise: p.times.rise.text,
      highest: p.times.transit.text,
      set: p.times.set.text,
      direction: p.direction,
      altitude_deg: Math.round(p.altitudeDeg),
      distance: distanceText(p.distanceKm),
      light_time: lightTimeText(p.lightTimeSeconds),
      visibility: p.visibility,
    })),
    computed_at: computedAt.toISOString(),
  };
}

/** The same table as plain HTML, for feed readers that do not know our extension. */
export function skyHtml(sky: FeedSky): string {
  const e = escapeMarkup;
  const rows = sky.planets
    .map(
      (p) =>
        `<tr><th scope="row">${e(p.name)}</th><td>${e(p.up_after_dusk ? 'Yes' : 'No')}</td><td>${e(p.rise)}</td><td>${e(p.highest)}</td><td>${e(p.set)}</td><td>${e(p.distance)}</td><td>${e(p.light_time)}</td></tr>`,
    )
    .join('');
  return (
    `<p>Sunset ${e(sky.sunset)}. ${e(sky.dark_from.charAt(0).toUpperCase() + sky.dark_from.slice(1))}. Moon: ${e(sky.moon.phase)}, ${sky.moon.illuminated_percent}% lit.</p>` +
    `<table><thead><tr><th scope="col">Planet</th><th scope="col">Up between dusk and dawn</th><th scope="col">Rises</th><th scope="col">Highest</th><th scope="col">Sets</th><th scope="col">Distance</th><th scope="col">Light takes</th></tr></thead><tbody>${rows}</tbody></table>`
  );
}
