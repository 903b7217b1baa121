import { createHash } from 'node:crypto';
import { Op } from 'sequelize';
import type { PublicPageDto } from '@shared/schemas/public-page.ts';
import { Page, SkyObject } from '../../models/index.ts';
import { feedFingerprint, type FeedDeps } from './feed-fingerprint.ts';
import { loadPublishedImages } from './feed-media.ts';
import { firstParagraphText, mediaIdsInHtml, slugify } from './feed-text.ts';
import { publicPageTexts } from '../pages/index.ts';
import { publicStatements } from '../statements/index.ts';
import { config } from '../../config.ts';
import { readForPublic } from './public-reads.ts';

/** Prepared bytes with their strong validator. */
export interface Prepared {
  body: Buffer;
  etag: string;
}

/** Every published page, built once per change, with the answers already serialised. */
export interface PublicPages {
  pages: PublicPageDto[];
  list: Prepared;
  bySlugOrId: Map<string, Prepared>;
  /** Atom documents per base URL (links in Atom are absolute). */
  atom: Map<string, Prepared>;
  deps: FeedDeps;
  fingerprint: string;
  checkedAt: number;
}

const CHECK_MS = config.feedCheckMs;

/** Serialises JSON once and names it by the SHA-256 of its bytes. */
export function prepare(value: unknown): Prepared {
  const body = Buffer.isBuffer(value) ? value : Buffer.from(typeof value === 'string' ? value : JSON.stringify(value));
  return { body, etag: `"${createHash('sha256').update(body).digest('base64url')}"` };
}

async function buildPublicPages(): Promise<Omit<PublicPages, 'fingerprint' | 'checkedAt'>> {
  const rows = await Page.findAll({
    where: { publishedSnapshot: { [Op.ne]: null } },
    attributes: ['id', 'locale', 'skyObjectId', 'publishedSnapshot'],
  });
  rows.sort(
    (a, b) =>
      (b.publishedSnapshot!.publishedAt ?? '').localeCompare(a.publishedSnapshot!.publishedAt ?? '') || a.id.localeCompare(b.id),
  );
  const statementIds = [...new Set(rows.flatMap((p) => Object.keys(p.publishedSnapshot!.statementTexts)))];
  const mediaIds = [...new Set(rows.flatMap((p) => mediaIdsInHtml(p.publishedSnapshot!.html)))];
  const [objects, statements, images] = await Promise.all([
    SkyObject.findAll({
      where: { id: { [Op.in]: [...new Set(rows.map((p) => p.skyObjectId))] } },
      attributes: ['id', 'name', 'kind'],
    }),
    publicStatements(statementIds),
    loadPublishedImages(mediaIds),
  ]);
  const objectById = new Map(objects.map((o) => [o.id, o]));
  const slugCount = new Map<string, number>();
  for (const p of rows)
    slugCount.set(slugify(p.publishedSnapshot!.title), (slugCount.get(slugify(p.publishedSnapshot!.title)) ?? 0) + 1);

  const pages: PublicPageDto[] = rows.map((p) => {
    const live = p.publishedSnapshot!;
    const base = slugify(live.title);
    // Statements that follow tonight show tonight's wording, in the list and in the page text alike.
    const shown = publicPageTexts(live, statements, p.locale);
    const object = objectById.get(p.skyObjectId);
    return {
      id: p.id,
      // Two live pages with one title: both get the start of their id, so neither link is ambiguous.
      slug: (slugCount.get(base) ?? 0) > 1 ? `${base}-${p.id.slice(0, 8)}` : base,
      title: live.title,
      locale: p.locale,
      object: { id: p.skyObjectId, name: object?.name ?? '', kind: object?.kind ?? '' },
      summary: firstParagraphText(shown.textHtml, 300),
      publishedAt: live.publishedAt ?? null,
      html: shown.html,
      statements: Object.entries(shown.statementTexts).map(([id, text]) => ({
        id,
        text,
        note: shown.notes[id] ?? null,
        asOf: statements.get(id)?.asOf ?? live.signedOffAt,
      })),
      images: mediaIdsInHtml(live.html).flatMap((id) => {
        const img = images.get(id);
        return img
          ? [
              {
                id,
                url: img.pageUrl,
                altText: img.image.alt,
                credit: img.credit,
                licence: img.licence,
                licenceUrl: img.licenceUrl,
                sourceUrl: img.sourceUrl,
              },
            ]
          : [];
      }),
    };
  });
  const bySlugOrId = new Map<string, Prepared>();
  for (const page of pages) {
    const prepared = prepare({ data: page });
    bySlugOrId.set(page.id, prepared);
    bySlugOrId.set(page.slug, prepared);
  }
  return {
    pages,
    list: prepare({ data: pages, meta: { total: pages.length } }),
    bySlugOrId,
    atom: new Map(),
    deps: { channelId: null, venueId: null, pageIds: [], statementIds, mediaIds, skyDate: null, allPublishedPages: true },
  };
}

let current: PublicPages | undefined;
let pending: { job: Promise<PublicPages>; startedAt: number } | undefined;
let generation = 0;

async function rebuild(asOf: number): Promise<PublicPages> {
  const started = generation;
  const before = current ? await feedFingerprint(current.deps) : '';
  const built = await buildPublicPages();
  const after = await feedFingerprint(built.deps);
  // Something moved while building (or an event came in): keep it, but rebuild on the next request.
  const settled = before === after && generation === started;
  current = { ...built, fingerprint: settled ? after : '', checkedAt: settled ? asOf : 0 };
  return current;
}

/** Checks (and rebuilds if need be) on the replica when it has caught up, else on the primary. */
function refresh(): Promise<PublicPages> {
  return readForPublic(async (asOf) => {
    if (current?.fingerprint && (await feedFingerprint(current.deps)) === current.fingerprint) {
      current.checkedAt = asOf;
      return current;
    }
    return rebuild(asOf);
  });
}

/**
 * The published pages, from memory unless something they show changed: a page published or
 * unpublished, a statement or image changed (events on this instance; the fingerprint, checked at
 * most once a second, for changes made on others).
 * @param checkedAfter when set, the answer must come from a check begun at or after this time (ms):
 *   a reader whose validator does not match may have been served a newer answer by another server
 */
export async function getPublicPages(checkedAfter = 0): Promise<PublicPages> {
  if (current && Date.now() - current.checkedAt < CHECK_MS && current.checkedAt >= checkedAfter) return current;
  if (pending && pending.startedAt >= checkedAfter) return pending.job;
  const job = refresh().finally(() => {
    if (pending?.job === job) pending = undefined;
  });
  pending = { job, startedAt: Date.now() };
  return job;
}

/**
 * Drops what is held in memory, so the next read rebuilds (keeping nothing stale): the wiring calls
 * it when a page is published or unpublished, an image's details change, or a statement's public
 * wording moves.
 */
export function invalidatePublicPages(): void {
  generation += 1;
  if (current) {
    current.checkedAt = 0;
    current.fingerprint = '';
  }
}
