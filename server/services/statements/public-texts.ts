import { Op } from 'sequelize';
import { findTemplate, type StatementLocale } from '@shared/statements/index.ts';
import { Statement } from '../../models/index.ts';

/** What the public is shown for one statement on a published page or slide. */
export interface PublicStatement {
  /** The wording for the night it describes, for a statement that follows tonight; null to keep the signed wording. */
  tonightTexts: Record<StatementLocale, string> | null;
  /** The date its shown wording counts from. */
  asOf: string;
}

/**
 * How the public pages and kiosk slides show statements. A page keeps the wording signed with it,
 * except for statements that follow tonight: their method was signed, and the number is the
 * night's (the accepted wording follows each night while the method stands), so a visitor is never
 * shown an old night as "tonight". A tonight statement that needs a reviewer again (changed or
 * broken) keeps the signed wording until it is accepted.
 * @param statementIds the statements shown
 * @returns by statement id
 */
export async function publicStatements(statementIds: string[]): Promise<Map<string, PublicStatement>> {
  if (statementIds.length === 0) return new Map();
  const rows = await Statement.findAll({
    where: { id: { [Op.in]: statementIds } },
    attributes: ['id', 'templateId', 'status', 'acknowledgedTexts', 'computedAt', 'acknowledgedAt'],
  });
  return new Map(
    rows.map((s) => {
      const follows = !!findTemplate(s.templateId)?.followsTonight && s.status === 'current' && s.acknowledgedTexts !== null;
      return [
        s.id,
        {
          tonightTexts: follows ? s.acknowledgedTexts : null,
          asOf: (follows ? s.computedAt : (s.acknowledgedAt ?? s.computedAt)).toISOString(),
        },
      ];
    }),
  );
}

/** The text to show for a statement on a published page: tonight's for one that follows tonight, else as signed. */
export function publicText(signed: string, shown: PublicStatement | undefined, locale: string): string {
  return shown?.tonightTexts?.[locale as StatementLocale] ?? signed;
}
