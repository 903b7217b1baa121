import type { Page } from '../models/index.ts';
import { anyStaff, hasRole, type Rule } from './utils.ts';

const owner = (user: Parameters<Rule>[0], page?: Page) => !!page && page.writerId === user.id;
const desk = hasRole('editor', 'admin');
const reviewer = hasRole('reviewer', 'admin');

/** A draft nobody has submitted yet is its writer's own: other writers and reviewers do not see it. */
const isPrivateDraft = (page: Page) => page.status === 'draft' && !page.submittedAt;

/**
 * Who may do what with object pages. These rules are about people; whether the page's state allows
 * the step (e.g. publishing a draft) is the workflow service's answer (409 with the reason).
 * - writers create pages, edit and submit their own; they read colleagues' pages once submitted;
 * - reviewers sign off statements and pages, resolve number flags, send back, comment;
 * - editors publish, unpublish and schedule, and may edit any page;
 * - editors archive and restore any page; a writer archives their own page while it is not live
 *   (taking a page off the public is the editors' call, as publishing is) and restores what they archived;
 * - a writer deletes their own draft; editors delete any page (the service refuses a page ever published);
 * - admins may do everything.
 */
export const pagePolicy = {
  list: anyStaff,
  create: hasRole('writer', 'editor', 'admin'),
  read: ((user, page) => !!page && (owner(user, page) || desk(user) || !isPrivateDraft(page))) as Rule<Page>,
  edit: ((user, page) => !!page && (owner(user, page) || desk(user))) as Rule<Page>,
  submit: ((user, page) => !!page && (owner(user, page) || desk(user))) as Rule<Page>,
  review: ((user, page) => !!page && reviewer(user) && !isPrivateDraft(page)) as Rule<Page>,
  comment: ((user, page) =>
    !!page &&
    (owner(user, page) || desk(user) || reviewer(user)) &&
    (owner(user, page) || !isPrivateDraft(page) || desk(user))) as Rule<Page>,
  publish: ((user, page) => !!page && desk(user)) as Rule<Page>,
  archive: ((user, page) => !!page && (desk(user) || (owner(user, page) && !page.publishedSnapshot))) as Rule<Page>,
  /** An archive an editor made is theirs to undo: a writer restores only what they archived themselves. */
  restore: ((user, page) =>
    !!page && (desk(user) || (owner(user, page) && (!page.archivedAt || page.archivedById === user.id)))) as Rule<Page>,
  delete: ((user, page) => !!page && (desk(user) || (owner(user, page) && page.status === 'draft'))) as Rule<Page>,
};
