import { appBaseUrl } from '../config.ts';
import type { MailMessage } from './mailer.ts';

/** What an admin needs to find a silent screen. */
export interface SilentScreen {
  screenName: string;
  venueId: string;
  venueName: string;
  channelName: string;
  lastSeenAt: Date | null;
  slideTitle: string | null;
  playerVersion: string | null;
}

const screensLink = (venueId: string) => `${appBaseUrl()}/venues/${venueId}`;
const when = (d: Date) => `${d.toISOString().slice(0, 16).replace('T', ' ')} UTC`;

/** To each admin, once per outage, when a screen has sent no heartbeat for the channel's set time. */
export function screenSilentMail(to: string, name: string, s: SilentScreen, minutes: number): MailMessage {
  return {
    to,
    subject: `Screen silent: ${s.screenName} at ${s.venueName}`,
    text: [
      `Hello ${name},`,
      '',
      `The kiosk screen “${s.screenName}” at ${s.venueName} (channel “${s.channelName}”) has not been heard from for over ${minutes} minutes.`,
      s.lastSeenAt ? `Last seen: ${when(s.lastSeenAt)}.` : 'It has not been seen since it was paired.',
      s.slideTitle ? `It was last showing: ${s.slideTitle}.` : '',
      s.playerVersion ? `Player version: ${s.playerVersion}.` : '',
      '',
      'It may be switched off, off the network, or asleep. A player keeps showing its saved slides while offline, so visitors may still see it. You will get one message per outage, and a short note when it is back.',
      screensLink(s.venueId),
    ]
      .filter((line, i, all) => line !== '' || all[i - 1] !== '')
      .join('\n'),
  };
}

/** To each admin when a screen reported silent is heard from again. */
export function screenBackMail(
  to: string,
  name: string,
  s: Pick<SilentScreen, 'screenName' | 'venueId' | 'venueName'>,
): MailMessage {
  return {
    to,
    subject: `Screen back: ${s.screenName} at ${s.venueName}`,
    text: [
      `Hello ${name},`,
      '',
      `The kiosk screen “${s.screenName}” at ${s.venueName} is sending heartbeats again (${when(new Date())}).`,
      screensLink(s.venueId),
    ].join('\n'),
  };
}
