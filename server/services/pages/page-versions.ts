import { UniqueConstraintError } from 'sequelize';
import type { PageVersionDto, PageVersionsDto } from '@shared/schemas/page-version.ts';
import { LOCALE_LABELS, LOCALE_REGISTRY, type StatementLocale } from '@shared/statements/locales.ts';
import { getSequelize } from '../../db.ts';
import { ConflictError, UnprocessableError } from '../../errors.ts';
import { Page, PageRevision, PageVersionGroup, type User } from '../../models/index.ts';
import { can } from '../../policies/index.ts';
import { recordAudit } from '../audit.ts';
import { appendRevision } from './page-revisions.ts';
import { currentText, loadStatements } from './page-statements.ts';

const label = (locale: string) => LOCALE_LABELS[locale as StatementLocale] ?? locale;

const alreadyThere = (locale: string, title: string) =>
  ConflictError(
    `This page already has a ${label(locale)} version (“${title}”). Open that version to change it; a page has one version per language.`,
    'version_exists',
  );

/**
 * The versions in a page's group, oldest first (the page alone when it has none).
 * @param page any version
 */
export async function versionsOf(page: Page): Promise<Page[]> {
  if (!page.versionGroupId) return [page];
  return Page.findAll({
    where: { versionGroupId: page.versionGroupId },
    order: [
      ['createdAt', 'ASC'],
      ['id', 'ASC'],
    ],
  });
}

/**
 * The version that stands for the group when a reader's languages are not there: the group's
 * default, or (when that was deleted) the oldest remaining version.
 */
export async function defaultVersionId(groupId: string | null, versions: Page[]): Promise<string | null> {
  if (!groupId) return versions[0]?.id ?? null;
  const group = await PageVersionGroup.findByPk(groupId, { attributes: ['defaultPageId'] });
  const id = group?.defaultPageId;
  return id && versions.some((v) => v.id === id) ? id : (versions[0]?.id ?? null);
}

/**
 * A page's language versions for the desk: each version with its own state, which is the default,
 * and the registered locales still missing.
 * @param page the version being looked at
 * @param viewer who asks (other writers' private drafts are listed but not openable)
 */
export async function listPageVersions(page: Page, viewer: User): Promise<PageVersionsDto> {
  const versions = await versionsOf(page);
  const defaultId = await defaultVersionId(page.versionGroupId, versions);
  const dtos: PageVersionDto[] = versions.map((v) => {
    const readable = can(viewer, 'page', 'read', v);
    return {
      id: v.id,
      locale: v.locale,
      label: label(v.locale),
      // Another writer's private draft is listed (its language is taken) but not its title.
      title: readable ? v.title : '',
      status: v.status,
      live: !!v.publishedSnapshot,
      isDefault: v.id === defaultId,
      current: v.id === page.id,
      readable,
    };
  });
  const taken = new Set<string>(versions.map((v) => v.locale));
  return {
    groupId: page.versionGroupId ?? null,
    versions: dtos,
    missing: LOCALE_REGISTRY.filter((l) => !taken.has(l.tag)).map((l) => ({
      locale: l.tag,
      label: l.label,
      addLabel: l.addLabel,
    })),
    can: { add: can(viewer, 'page', 'create') && can(viewer, 'page', 'read', page) },
  };
}

/**
 * Makes a version of a page in another locale: a new draft with the same title and structure (text,
 * images, eye-safety notice and statements, copied from the source's working copy) whose statements
 * render in the new locale by themselves (the same numbers, their own words and number formats).
 * The new version has its own review and publication; the writer translates the text around the
 * statements. The source and the new page join one version group (made now, the source as its
 * default, when the source had none).
 * @param source the version to copy
 * @param locale a registered locale
 * @param actor the writer of the new version
 * @throws HttpError 409 `version_exists` when the group already has a version in that locale;
 *   422 `statements_fail_in_locale` when a statement has no wording in that locale (nothing is written)
 */
export async function createPageVersion(source: Page, locale: StatementLocale, actor: User): Promise<Page> {
  const revision = (await PageRevision.findByPk(source.currentRevisionId!))!;
  const statements = await loadStatements(revision.statementIds);
  const failing = revision.statementIds.flatMap((id) => {
    const s = statements.get(id);
    if (!s) return [`a statement that no longer exists (${id.slice(0, 8)})`];
    if (s.statement.status === 'broken')
      return [`“${s.templateTitle}” for ${s.objectName} (${s.statement.statusReason ?? 'it cannot be worked out'})`];
    return currentText(s.statement, locale) ? [] : [`“${s.templateTitle}” for ${s.objectName} (no ${label(locale)} wording yet)`];
  });
  if (failing.length) {
    throw UnprocessableError(
      `This page cannot have a ${label(locale)} version yet: ${failing.join('; ')}. Recompute or remove ${failing.length === 1 ? 'that statement' : 'those statements'} on this page first.`,
      'statements_fail_in_locale',
    );
  }
  try {
    return await getSequelize().transaction(async (transaction) => {
      const locked = (await Page.findByPk(source.id, { transaction, lock: transaction.LOCK.UPDATE }))!;
      if (locked.locale === locale) throw alreadyThere(locale, locked.title);
      let groupId = locked.versionGroupId;
      if (groupId) {
        const existing = await Page.findOne({ where: { versionGroupId: groupId, locale }, attributes: ['title'], transaction });
        if (existing) throw alreadyThere(locale, existing.title);
      } else {
        groupId = (await PageVersionGroup.create({ defaultPageId: locked.id }, { transaction })).id;
        locked.versionGroupId = groupId;
        await locked.save({ transaction });
      }
      const page = await Page.create(
        { title: revision.title, skyObjectId: locked.skyObjectId, locale, writerId: actor.id, versionGroupId: groupId },
        { transaction },
      );
      const first = await appendRevision(
        { pageId: page.id, title: revision.title, doc: revision.doc, authorId: actor.id },
        transaction,
      );
      page.currentRevisionId = first.id;
      await page.save({ transaction });
      await recordAudit(
        {
          actorId: actor.id,
          action: 'page.version_created',
          subjectType: 'page',
          subjectId: page.id,
          data: { from: locked.id, fromRevision: revision.number, locale, groupId },
        },
        transaction,
      );
      return page;
    });
  } catch (error) {
    // Two requests at once: the unique index (group, locale) lets one through.
    if (error instanceof UniqueConstraintError) {
      const groupId = (await Page.findByPk(source.id, { attributes: ['versionGroupId'] }))?.versionGroupId ?? null;
      const existing = groupId ? await Page.findOne({ where: { versionGroupId: groupId, locale }, attributes: ['title'] }) : null;
      throw alreadyThere(locale, existing?.title ?? source.title);
    }
    throw error;
  }
}
