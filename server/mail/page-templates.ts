import { appBaseUrl } from '../config.ts';
import type { MailMessage } from './mailer.ts';

const pageLink = (pageId: string, view: 'edit' | 'review' = 'review') =>
  `${appBaseUrl()}/pages/${pageId}${view === 'review' ? '/review' : ''}`;

/** To each reviewer when a page is submitted. */
export function pageSubmittedMail(to: string, name: string, page: { id: string; title: string }, writer: string): MailMessage {
  return {
    to,
    subject: `For review: ${page.title}`,
    text: [
      `Hello ${name},`,
      '',
      `${writer} has submitted “${page.title}” for review. Check the working of each statement, resolve any hand-typed numbers and sign it off, or send it back with a comment:`,
      pageLink(page.id),
    ].join('\n'),
  };
}

/** To the writer and the last reviewer when a statement on an approved or published page changed. */
export function pageRecheckMail(
  to: string,
  name: string,
  page: { id: string; title: string },
  changes: Array<{ oldText: string | null; newText: string | null }>,
  live: boolean,
): MailMessage {
  const lines = changes.flatMap((c, i) => [
    `${i + 1}. Signed off: ${c.oldText ?? '(none)'}`,
    `   Now:        ${c.newText ?? '(cannot be worked out)'}`,
  ]);
  return {
    to,
    subject: `Needs re-check: ${page.title}`,
    text: [
      `Hello ${name},`,
      '',
      `The data behind ${changes.length === 1 ? 'a statement' : `${changes.length} statements`} on “${page.title}” changed, and the public wording moved:`,
      '',
      ...lines,
      '',
      live
        ? 'The published version stays live, unchanged, until a reviewer signs off the new wording and an editor publishes it.'
        : 'A reviewer needs to sign off the new wording before the page can be published.',
      pageLink(page.id),
    ].join('\n'),
  };
}

/** To the writer when a reviewer sends a page back. */
export function pageSentBackMail(
  to: string,
  name: string,
  page: { id: string; title: string },
  reviewer: string,
  comment: string,
): MailMessage {
  return {
    to,
    subject: `Sent back: ${page.title}`,
    text: [
      `Hello ${name},`,
      '',
      `${reviewer} sent “${page.title}” back to you:`,
      '',
      comment,
      '',
      pageLink(page.id, 'edit'),
    ].join('\n'),
  };
}

/** The morning summary for people who asked for it. */
export function pageDigestMail(
  to: string,
  name: string,
  sections: Array<{ title: string; pages: Array<{ id: string; title: string }> }>,
): MailMessage {
  const body = sections.flatMap((s) => [
    `${s.title} (${s.pages.length})`,
    ...s.pages.map((p) => `  • ${p.title} — ${pageLink(p.id)}`),
    '',
  ]);
  return {
    to,
    subject: `Starproof: ${sections.reduce((n, s) => n + s.pages.length, 0)} pages waiting for you`,
    text: [
      `Hello ${name},`,
      '',
      'Here is what needs your attention today:',
      '',
      ...body,
      `Turn this e-mail off on your overview page: ${appBaseUrl()}/`,
    ].join('\n'),
  };
}
