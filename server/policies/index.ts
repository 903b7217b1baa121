import { AuthorizationError } from '../errors.ts';
import type { User } from '../models/index.ts';
import { cataloguePolicy } from './catalogue.ts';
import { channelPolicy } from './channel.ts';
import { mediaPolicy } from './media.ts';
import { outboxPolicy } from './outbox.ts';
import { pagePolicy } from './page.ts';
import { settingsPolicy } from './settings.ts';
import { statementPolicy } from './statement.ts';
import { timelinePolicy } from './timeline.ts';
import { userPolicy } from './user.ts';
import { venuePolicy } from './venue.ts';
import type { Rule } from './utils.ts';

/** Every resource's rules, in one place; routes and presenters both read them. */
export const policies = {
  user: userPolicy,
  outbox: outboxPolicy,
  media: mediaPolicy,
  catalogue: cataloguePolicy,
  statement: statementPolicy,
  settings: settingsPolicy,
  timeline: timelinePolicy,
  venue: venuePolicy,
  page: pagePolicy,
  channel: channelPolicy,
} satisfies Record<string, Record<string, Rule<never>>>;

type Policies = typeof policies;

/** True when user may do action on resource (and record, for record-level rules). */
export function can<R extends keyof Policies, A extends keyof Policies[R]>(
  user: User | undefined,
  resource: R,
  action: A,
  record?: Parameters<Extract<Policies[R][A], Rule<never>>>[1],
): boolean {
  if (!user?.active) return false;
  const rule = policies[resource][action] as Rule<unknown>;
  return rule(user, record);
}

/**
 * Throws 403 unless the user may act. A missing record is refused the same way (never a crash),
 * and after the call TypeScript knows the record is present.
 * @throws HttpError 403
 */
export function authorize<R extends keyof Policies, A extends keyof Policies[R], T>(
  user: User | undefined,
  resource: R,
  action: A,
  record?: T | null,
): asserts record {
  if (!can(user, resource, action, record as never)) throw AuthorizationError();
}
