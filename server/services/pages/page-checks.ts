import { eyeSafetyReason } from '@shared/editor/caution.ts';
import { blockTexts, hasEyeSafetyNotice, STATEMENT_PLACEHOLDER } from '@shared/editor/doc-text.ts';
import { checkNumbers, type NumberFlag } from '@shared/editor/number-check.ts';
import { REQUIREMENT_LABELS } from '@shared/media/schemas.ts';
import { findTemplate } from '@shared/statements/index.ts';
import { PageNumberFlag, PageSignoff, SkyObject, type Page, type PageRevision } from '../../models/index.ts';
import { isMediaReadyForPublishing } from '../media/index.ts';
import { currentText, type LoadedStatement } from './page-statements.ts';

/** The page's plain text, statements left out: what the caution and number checks read. */
export function plainText(revision: PageRevision): string {
  return blockTexts(revision.doc)
    .map((b) => b.text.replaceAll(STATEMENT_PLACEHOLDER, ' '))
    .join('\n');
}

/**
 * Why the page needs the eye-safety notice, or null.
 * @param objectKind the page object's kind
 */
export function eyeSafetyRequirement(objectKind: string | null, revision: PageRevision): string | null {
  return eyeSafetyReason(objectKind, `${revision.title}\n${plainText(revision)}`);
}

/** Number flags with the reviewer's resolution, if any. */
export async function flagsWithResolutions(
  page: Page,
  revision: PageRevision,
): Promise<Array<NumberFlag & { resolution: PageNumberFlag | null }>> {
  const flags = checkNumbers(revision.doc);
  if (!flags.length) return [];
  const resolutions = new Map((await PageNumberFlag.findAll({ where: { pageId: page.id } })).map((r) => [r.normalisedText, r]));
  return flags.map((f) => ({ ...f, resolution: resolutions.get(f.normalised) ?? null }));
}

/**
 * What stops a page from going to review: an empty page, a missing eye-safety notice, statements
 * that cannot be worked out or no longer exist.
 */
export async function submissionProblems(
  page: Page,
  revision: PageRevision,
  statements: Map<string, LoadedStatement>,
): Promise<string[]> {
  const problems: string[] = [];
  if (!plainText(revision).trim() && !revision.statementIds.length) problems.push('The page is empty.');
  const object = await SkyObject.findByPk(page.skyObjectId, { attributes: ['kind'] });
  const caution = eyeSafetyRequirement(object?.kind ?? null, revision);
  if (caution && !hasEyeSafetyNotice(revision.doc))
    problems.push(`${caution}: add the eye-safety notice block (toolbar, “Eye-safety notice”) before submitting.`);
  for (const id of revision.statementIds) {
    const loaded = statements.get(id);
    if (!loaded) problems.push('A statement on the page no longer exists; remove it.');
    else if (loaded.statement.status === 'broken' || !currentText(loaded.statement, page.locale)) {
      problems.push(
        `“${loaded.templateTitle}” for ${loaded.objectName} cannot be worked out (${loaded.statement.statusReason ?? 'its inputs are missing'}); remove it or ask a reviewer to fix its inputs.`,
      );
    }
  }
  return problems;
}

/**
 * Whether a sign-off still holds for a statement that follows tonight although its number moved:
 * it is current (only the night changed since its wording was accepted) and was signed off after
 * a reviewer last accepted its wording, so the reviewer signed off the method that is in use.
 */
function followsSignedNight(statement: LoadedStatement['statement'], signedAt: Date): boolean {
  if (!findTemplate(statement.templateId)?.followsTonight || statement.status !== 'current') return false;
  return !statement.acknowledgedAt || signedAt >= statement.acknowledgedAt;
}

/**
 * Statement sign-offs on this revision that match the wording shown now (or, for a statement
 * that follows tonight, its method: a new night does not undo a sign-off), by statement id.
 */
export async function validStatementSignoffs(
  page: Page,
  _revision: PageRevision,
  statements: Map<string, LoadedStatement>,
): Promise<Set<string>> {
  // Any revision's sign-off counts while the statement still reads as signed: a send-back or a
  // withdrawal and a new draft do not undo what a reviewer checked and nobody changed.
  const rows = await PageSignoff.findAll({ where: { pageId: page.id, kind: 'statement' } });
  const valid = new Set<string>();
  for (const row of rows) {
    const loaded = row.statementId ? statements.get(row.statementId) : undefined;
    if (
      loaded &&
      (currentText(loaded.statement, page.locale) === row.statementText || followsSignedNight(loaded.statement, row.createdAt))
    )
      valid.add(row.statementId!);
  }
  return valid;
}

/**
 * What stops a reviewer from signing the page off: everything that stops submission, plus number
 * flags not yet resolved, statements not signed off with their current wording, and images that
 * lack a credit, licence, alt text or renditions.
 */
export async function approvalProblems(
  page: Page,
  revision: PageRevision,
  statements: Map<string, LoadedStatement>,
): Promise<string[]> {
  const problems = await submissionProblems(page, revision, statements);
  const open = (await flagsWithResolutions(page, revision)).filter((f) => !f.resolution);
  if (open.length)
    problems.push(
      `${open.length === 1 ? 'One hand-typed number is' : `${open.length} hand-typed numbers are`} not resolved (${open.map((f) => `“${f.text}”`).join(', ')}): turn each into a statement or mark it as not a measured quantity.`,
    );
  const signed = await validStatementSignoffs(page, revision, statements);
  const unsigned = revision.statementIds.filter((id) => !signed.has(id) && statements.has(id));
  if (unsigned.length)
    problems.push(
      `${unsigned.length === 1 ? 'One statement has' : `${unsigned.length} statements have`} not been signed off with the wording shown now.`,
    );
  for (const mediaId of revision.mediaIds) {
    const { ready, missing } = await isMediaReadyForPublishing(mediaId);
    if (!ready)
      problems.push(
        `An image is not ready for publishing: it lacks ${missing.map((m) => REQUIREMENT_LABELS[m as keyof typeof REQUIREMENT_LABELS] ?? m).join(', ')}.`,
      );
  }
  return problems;
}
