import { QueryTypes } from 'sequelize';
import { STATEMENT_RULES_VERSION } from '@shared/statements/index.ts';
import { getSequelize } from '../../db.ts';
import { getSettings } from '../settings/index.ts';
import { enqueueRecompute } from './recompute.ts';

/**
 * After a release that changed the statement rules, queues one recompute of every statement, so no
 * stored statement keeps wording or a validity the rules no longer give: each becomes current, changed
 * (new wording for a reviewer to accept, the published wording staying live meanwhile) or broken
 * with its reason ("Needs review: … not for an object of kind …", "Needs input: …").
 * The release is recorded only after the recompute is queued, so a crash in between queues it again
 * (two servers starting together queue it once: one job per rules version and hour, by singleton key).
 * @returns true when a recompute was queued
 */
export async function recomputeAfterRulesRelease(): Promise<boolean> {
  const settings = await getSettings();
  if (settings.statementRulesVersion >= STATEMENT_RULES_VERSION) return false;
  await enqueueRecompute({ scope: { all: true } }, { singletonKey: `rules-${STATEMENT_RULES_VERSION}`, singletonSeconds: 3600 });
  await getSequelize().query(
    'UPDATE organisation_settings SET statement_rules_version = :version WHERE id = 1 AND statement_rules_version < :version',
    { replacements: { version: STATEMENT_RULES_VERSION }, type: QueryTypes.UPDATE },
  );
  return true;
}
