/**
 * Object pages: drafts, revisions, review and sign-off, publication, re-checks, rendering.
 * The public face of the domain: other domains and routes import from here, never a file inside.
 */
export { dashboardFor, setDigest } from './page-dashboard.ts';
export { loadPageDetail } from './page-detail.ts';
export { diffRevisions } from './page-diff.ts';
export { DIGEST_JOB, PUBLISH_DUE_JOB, runDigestJob, runPublishDueJob } from './page-digest.ts';
export { listPages } from './page-list.ts';
export { publishPage, schedulePublish, unpublishPage } from './page-publish.ts';
export { pagesUsingMedia, queuePageRecheck } from './page-reactions.ts';
export { PAGE_RECHECK_JOB, runPageRecheckJob } from './page-recheck.ts';
export { publicPageTexts, renderPublishedPage, renderWithLookups } from './page-render.ts';
export { createPage, savePage } from './page-save.ts';
export { resolveNumberFlag, signOffPage, signOffStatement } from './page-signoff.ts';
export { currentText, loadStatements } from './page-statements.ts';
export { currentApprovalProblems, sendBackPage, submitPage, withdrawPage } from './page-workflow.ts';
export { addPageComment } from './page-comments.ts';
export { listPageComments } from './page-comments.ts';
export { queueRecheckClear } from './page-reactions.ts';
export { RECHECK_CLEAR_JOB, runRecheckClearJob } from './page-recheck.ts';
export { createPageVersion, listPageVersions } from './page-versions.ts';
export { archivePage, deletePage, restorePage } from './page-archive.ts';
