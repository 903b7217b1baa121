import type { JSONContent } from '@tiptap/core';
import { hasEyeSafetyNotice } from '@shared/editor/doc-text.ts';
import type { PageDto, PageMediaDto } from '@shared/schemas/page.ts';
import { Op } from 'sequelize';
import { findLicence } from '@shared/media/licences.ts';
import { renditionUrl } from '../../media/keys.ts';
import {
  AuditEvent,
  Media,
  MediaRendition,
  PageComment,
  PageRevision,
  PageSignoff,
  SkyObject,
  User,
  type Page,
} from '../../models/index.ts';
import { pageAbilities, presentPageRow } from '../../presenters/page.ts';
import { missingForPublishing } from '../media/index.ts';
import { eyeSafetyRequirement, flagsWithResolutions, validStatementSignoffs } from './page-checks.ts';
import { currentText, loadStatements } from './page-statements.ts';

async function loadPageMedia(ids: string[]): Promise<PageMediaDto[]> {
  if (!ids.length) return [];
  const rows = await Media.findAll({ where: { id: { [Op.in]: ids } }, include: [{ model: MediaRendition, as: 'renditions' }] });
  return rows.map((m) => {
    const r =
      (m.renditions ?? []).find((x) => x.name === 'page' && x.format === 'webp') ??
      (m.renditions ?? []).find((x) => x.name === 'page');
    return {
      id: m.id,
      url: r ? renditionUrl(r.storageKey) : null,
      altText: m.altText,
      credit: m.credit,
      licence: findLicence(m.licenceId)?.label ?? null,
      missing: missingForPublishing(m),
    };
  });
}

const names = async (ids: Array<string | null | undefined>) => {
  const wanted = [...new Set(ids.filter((id): id is string => !!id))];
  return new Map(
    (await User.findAll({ where: { id: { [Op.in]: wanted } }, attributes: ['id', 'name'] })).map((u) => [u.id, u.name]),
  );
};

/**
 * Everything the editor and the review screen show about a page: the working copy, its statements
 * (wording now and as signed off), number flags with resolutions, images, the caution check, the
 * approved and live versions, and what the viewer may do.
 */
/**
 * The reviewer's reason when the page's last workflow step was a send-back (the comment written
 * with it); null once the page moved on (submitted, withdrawn, approved).
 */
async function lastSendBack(page: Page): Promise<PageDto['sentBack']> {
  if (page.status !== 'draft') return null;
  const last = await AuditEvent.findOne({
    where: { subjectType: 'page', subjectId: page.id, action: ['page.sent_back', 'page.submitted', 'page.withdrawn'] },
    order: [['createdAt', 'DESC']],
  });
  if (last?.action !== 'page.sent_back') return null;
  const comment = await PageComment.findOne({
    where: { pageId: page.id, authorId: last.actorId },
    order: [['createdAt', 'DESC']],
    include: [{ model: User, as: 'author', attributes: ['name'] }],
  });
  if (!comment) return null;
  return { by: comment.author?.name ?? null, at: comment.createdAt.toISOString(), reason: comment.body };
}

export async function loadPageDetail(page: Page, viewer: User): Promise<PageDto> {
  const revision = (await PageRevision.findByPk(page.currentRevisionId!))!;
  const statements = await loadStatements(revision.statementIds);
  const [object, flags, media, signed] = await Promise.all([
    SkyObject.findByPk(page.skyObjectId, { attributes: ['id', 'name', 'kind'] }),
    flagsWithResolutions(page, revision),
    loadPageMedia(revision.mediaIds),
    validStatementSignoffs(page, revision, statements),
  ]);
  const people = await names([
    page.writerId,
    revision.authorId,
    page.lastReviewerId,
    ...flags.map((f) => f.resolution?.resolvedById),
  ]);
  const pageSignoff =
    page.approvedRevisionId === revision.id && (page.status === 'approved' || page.status === 'published')
      ? await PageSignoff.findOne({
          where: { pageId: page.id, revisionId: revision.id, kind: 'page' },
          order: [['createdAt', 'DESC']],
        })
      : null;
  const signedTexts = page.approvedSnapshot?.statementTexts ?? {};
  return {
    ...presentPageRow(
      page,
      object ?? undefined,
      { id: page.writerId, name: people.get(page.writerId) ?? '(former staff)' },
      revision.number,
    ),
    version: page.version,
    doc: revision.doc as JSONContent,
    revision: {
      id: revision.id,
      number: revision.number,
      createdAt: revision.createdAt.toISOString(),
      author: revision.authorId ? (people.get(revision.authorId) ?? null) : null,
    },
    statements: revision.statementIds.map((id) => {
      const loaded = statements.get(id);
      if (!loaded)
        return {
          id,
          templateTitle: 'Statement removed',
          objectName: '',
          status: 'broken',
          statusReason: 'This statement no longer exists.',
          text: null,
          signedText: signedTexts[id] ?? null,
          signedOff: false,
        };
      const s = loaded.statement;
      return {
        id,
        templateTitle: loaded.templateTitle,
        objectName: loaded.objectName,
        status: s.status,
        statusReason: s.statusReason ?? null,
        text: currentText(s, page.locale),
        signedText: signedTexts[id] ?? null,
        signedOff: signed.has(id),
      };
    }),
    flags: flags.map((f) => ({
      text: f.text,
      normalised: f.normalised,
      block: f.block,
      from: f.from,
      to: f.to,
      resolution: f.resolution
        ? {
            reason: f.resolution.reason,
            by: f.resolution.resolvedById ? (people.get(f.resolution.resolvedById) ?? null) : null,
            at: f.resolution.createdAt.toISOString(),
          }
        : null,
    })),
    media,
    eyeSafety: { required: eyeSafetyRequirement(object?.kind ?? null, revision), present: hasEyeSafetyNotice(revision.doc) },
    approved: page.approvedSnapshot
      ? {
          revisionNumber: page.approvedSnapshot.revisionNumber,
          at: page.approvedSnapshot.signedOffAt,
          by: page.approvedSnapshot.signedOffBy?.name ?? null,
        }
      : null,
    published: page.publishedSnapshot
      ? {
          revisionNumber: page.publishedSnapshot.revisionNumber,
          at: page.publishedSnapshot.publishedAt ?? null,
          title: page.publishedSnapshot.title,
        }
      : null,
    pageSignedOff: !!pageSignoff,
    lastReviewer: page.lastReviewerId ? (people.get(page.lastReviewerId) ?? null) : null,
    submittedAt: page.submittedAt?.toISOString() ?? null,
    sentBack: await lastSendBack(page),
    can: pageAbilities(page, viewer),
  };
}
