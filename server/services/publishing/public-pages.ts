import { createHash } from 'node:crypto';
import { Op } from 'sequelize';
import type { PublicPageDto } from '@shared/schemas/public-page.ts';
import { Page, PageVersionGroup, SkyObject } from '../../models/index.ts';
import { appBaseUrl } from '../../config.ts';
import { chooseVersion, type VersionChoice } from './public-languages.ts';
import { feedFingerprint, type FeedDeps } from './feed-fingerprint.ts';
import { loadPublishedImages } from './feed-media.ts';
import { firstParagraphText, mediaIdsInHtml, slugify } from './feed-text.ts';
import { publicPageTexts } from '../pages/index.ts';
import { loadStatementEvidence, publicStatements } from '../statements/index.ts';
import { getSettings } from '../settings/index.ts';
import { eyeSafetyReason } from '@shared/editor/caution.ts';
import { config } from '../../config.ts';
import { absoluteHtml, publicPageUrl } from './public-urls.ts';
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
  /** Slug or id → the page's id; page id → its published versions, the default first. */
  idBySlugOrId: Map<string, string>;
  versions: Map<string, VersionChoice[]>;
  byId: Map<string, PublicPageDto>;
  /** Lists answered for one choice of language, by that choice. */
  lists: Map<string, Prepared>;
  /** Atom documents per base URL (links in Atom are absolute). */
  atom: Map<string, Prepared>;
  /** Rendered public HTML (pages, index, sitemap, fragments) by route key, made on first request. */
  rendered: Map<string, Prepared>;
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
    attributes: ['id', 'locale', 'skyObjectId', 'publishedSnapshot', 'versionGroupId', 'createdAt'],
  });
  const groupIds = [...new Set(rows.flatMap((p) => (p.versionGroupId ? [p.versionGroupId] : [])))];
  const defaults = new Map(
    (groupIds.length ? await PageVersionGroup.findAll({ where: { id: { [Op.in]: groupIds } } }) : []).map((g) => [
      g.id,
      g.defaultPageId,
    ]),
  );
  rows.sort(
    (a, b) =>
      (b.publishedSnapshot!.publishedAt ?? '').localeCompare(a.publishedSnapshot!.publishedAt ?? '') || a.id.localeCompare(b.id),
  );
  const statementIds = [...new Set(rows.flatMap((p) => Object.keys(p.publishedSnapshot!.statementTexts)))];
  const mediaIds = [...new Set(rows.flatMap((p) => mediaIdsInHtml(p.publishedSnapshot!.html)))];
  const [objects, statements, images, evidence, settings] = await Promise.all([
    SkyObject.findAll({
      where: { id: { [Op.in]: [...new Set(rows.map((p) => p.skyObjectId))] } },
      attributes: ['id', 'name', 'kind'],
    }),
    publicStatements(statementIds),
    loadPublishedImages(mediaIds),
    loadStatementEvidence(statementIds),
    getSettings(),
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
    // Two live pages with one title: both get the start of their id, so neither link is ambiguous.
    const slug = (slugCount.get(base) ?? 0) > 1 ? `${base}-${p.id.slice(0, 8)}` : base;
    const plainText = `${live.title} ${shown.textHtml.replace(/<[^>]*>/g, ' ')}`;
    return {
      id: p.id,
      slug,
      url: publicPageUrl(slug),
      title: live.title,
      locale: p.locale,
      object: { id: p.skyObjectId, name: object?.name ?? '', kind: object?.kind ?? '' },
      summary: firstParagraphText(shown.textHtml, 300),
      publishedAt: live.publishedAt ?? null,
      html: absoluteHtml(shown.html),
      eyeSafetyNotice: eyeSafetyReason(object?.kind, plainText) ? settings.eyeSafetyNotice : null,
      statements: Object.entries(shown.statementTexts).map(([id, text]) => {
        const working = evidence.get(id);
        return {
          id,
          text,
          note: shown.notes[id] ?? null,
          asOf: statements.get(id)?.asOf ?? live.signedOffAt,
          // The working belongs to the wording it was computed with: a page still showing older
          // signed wording (the data moved, a reviewer has yet to look) shows none rather than another number's.
          howWeKnow:
            working?.texts?.[p.locale as keyof typeof working.texts] === text
              ? working.evidence(p.locale, live.signedOffAt)
              : null,
        };
      }),
      alternates: [],
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
  const versions = publishedVersions(rows, defaults);
  const byId = new Map(pages.map((p) => [p.id, p]));
  const base = appBaseUrl().replace(/\/+$/, '');
  for (const page of pages) {
    const group = versions.get(page.id)!;
    page.alternates = group.map((v, i) => {
      const other = byId.get(v.id)!;
      return {
        hreflang: v.locale,
        title: other.title,
        slug: other.slug,
        href: `${base}/api/public/pages/${other.slug}`,
        isDefault: i === 0,
      };
    });
  }
  const bySlugOrId = new Map<string, Prepared>();
  const idBySlugOrId = new Map<string, string>();
  for (const page of pages) {
    const prepared = prepare({ data: page });
    bySlugOrId.set(page.id, prepared);
    bySlugOrId.set(page.slug, prepared);
    idBySlugOrId.set(page.id, page.id);
    idBySlugOrId.set(page.slug, page.id);
  }
  return {
    pages,
    list: prepare({ data: pages, meta: { total: pages.length } }),
    bySlugOrId,
    idBySlugOrId,
    versions,
    byId,
    lists: new Map(),
    atom: new Map(),
    rendered: new Map(),
    deps: { channelId: null, venueId: null, pageIds: [], statementIds, mediaIds, skyDate: null, allPublishedPages: true },
  };
}

/**
 * Each published page's published language versions, the group's default first (or, when the
 * default is not published or was deleted, the oldest published version), then oldest first.
 */
function publishedVersions(rows: Page[], defaults: Map<string, string | null>): Map<string, VersionChoice[]> {
  const groups = new Map<string, Page[]>();
  for (const p of rows) {
    const key = p.versionGroupId ?? p.id;
    groups.set(key, [...(groups.get(key) ?? []), p]);
  }
  const result = new Map<string, VersionChoice[]>();
  for (const [key, members] of groups) {
    const defaultId = defaults.get(key) ?? null;
    const ordered = [...members].sort(
      (a, b) =>
        Number(b.id === defaultId) - Number(a.id === defaultId) ||
        a.createdAt.getTime() - b.createdAt.getTime() ||
        a.id.localeCompare(b.id),
    );
    const choices = ordered.map((p) => ({ id: p.id, locale: p.locale }));
    for (const p of members) result.set(p.id, choices);
  }
  return result;
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

/** A negotiated answer: the prepared bytes, the page (for headers) or null for a list. */
export interface NegotiatedPage {
  prepared: Prepared;
  page: PublicPageDto;
}

/**
 * The language version of a published page a reader gets (see chooseVersion), prepared.
 * @param slugOrId what the address names, lower case
 * @param lang `?lang=`, checked against the registry
 * @param ranked Accept-Language ranges by preference, or null without the header
 * @returns undefined when no published page has that slug or id
 */
export function negotiatedPage(
  pages: PublicPages,
  slugOrId: string,
  lang: string | undefined,
  ranked: string[] | null,
): NegotiatedPage | undefined {
  const id = pages.idBySlugOrId.get(slugOrId);
  if (!id) return undefined;
  const versions = pages.versions.get(id)!;
  const chosen = chooseVersion(versions, versions.find((v) => v.id === id)!, lang, ranked);
  return { prepared: pages.bySlugOrId.get(chosen.id)!, page: pages.byId.get(chosen.id)! };
}

/**
 * The list of published pages. With no language asked for (neither `?lang=` nor Accept-Language),
 * every version; otherwise one version per page, chosen as for a single page.
 */
export function negotiatedList(pages: PublicPages, lang: string | undefined, ranked: string[] | null): Prepared {
  if (!lang && !ranked) return pages.list;
  const key = JSON.stringify([lang ?? null, ranked]);
  let list = pages.lists.get(key);
  if (!list) {
    const seen = new Set<VersionChoice[]>();
    const chosen: PublicPageDto[] = [];
    for (const page of pages.pages) {
      const versions = pages.versions.get(page.id)!;
      if (seen.has(versions)) continue;
      seen.add(versions);
      chosen.push(pages.byId.get(chooseVersion(versions, versions[0]!, lang, ranked).id)!);
    }
    if (pages.lists.size >= 64) pages.lists.clear();
    list = prepare({ data: chosen, meta: { total: chosen.length } });
    pages.lists.set(key, list);
  }
  return list;
}
