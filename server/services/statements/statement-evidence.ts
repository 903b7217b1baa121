import { Op } from 'sequelize';
import { sourceHref } from '@shared/catalogue/source-link.ts';
import type { StatementLocale } from '@shared/statements/index.ts';
import { publicEvidence, type PublicEvidence } from '@shared/statements/public-evidence.ts';
import { CosmologyDescription, Source, Statement } from '../../models/index.ts';
import { readWorking } from './working-store.ts';

/** A statement's working as the public may read it, for the wording it was computed with. */
export interface StatementEvidence {
  /** The wording (per locale) this working belongs to: shown only beside that wording. */
  texts: Record<StatementLocale, string> | null;
  /**
   * The working retold for visitors, in a page's locale.
   * @param pageSignedOffAt when the page showing it was signed off (a reviewer read this statement then)
   */
  evidence: (locale: string, pageSignedOffAt: string) => PublicEvidence;
}

/**
 * Loads what "How we know" needs for published statements: inputs, unpacked working, cosmology
 * and the links of their sources, in three queries (plus the working skeletons not yet cached).
 * @param statementIds the statements shown on published pages
 * @returns by statement id; a statement that is broken or was never computed has none
 */
export async function loadStatementEvidence(statementIds: string[]): Promise<Map<string, StatementEvidence>> {
  if (statementIds.length === 0) return new Map();
  const rows = await Statement.findAll({
    where: { id: { [Op.in]: statementIds }, status: { [Op.ne]: 'broken' } },
    attributes: ['id', 'templateId', 'status', 'texts', 'inputs', 'working', 'modelId', 'acknowledgedAt', 'computedAt', 'night'],
    include: [{ model: CosmologyDescription, as: 'modelDescription' }],
  });
  const sourceIds = [...new Set(rows.flatMap((s) => (s.inputs ?? []).map((i) => i.sourceId)))];
  const sources = sourceIds.length
    ? await Source.findAll({ where: { id: { [Op.in]: sourceIds } }, attributes: ['id', 'doi', 'bibcode', 'url'] })
    : [];
  const links = new Map(sources.map((s) => [s.id, sourceHref(s)]));
  const found = new Map<string, StatementEvidence>();
  for (const s of rows) {
    const working = await readWorking(s.working);
    const input = { templateId: s.templateId, inputs: s.inputs ?? [], sourceLinks: links, working, model: s.model };
    // A statement following tonight was checked for its method and is worked out each night; any
    // other was last checked by a person: when a reviewer accepted its wording or signed off the page.
    const checkedAt = (pageSignedOffAt: string) =>
      s.night
        ? s.computedAt.toISOString()
        : [s.acknowledgedAt?.toISOString() ?? '', pageSignedOffAt].reduce((a, b) => (a > b ? a : b));
    found.set(s.id, {
      texts: s.texts ?? null,
      evidence: (locale, pageSignedOffAt) => publicEvidence({ ...input, checkedAt: checkedAt(pageSignedOffAt) }, locale),
    });
  }
  return found;
}
