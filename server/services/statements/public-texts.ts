import { Op } from 'sequelize';
import { findTemplate, type StatementLocale } from '@shared/statements/index.ts';
import { Statement } from '../../models/index.ts';

/** What the public is shown for one statement on a published page or slide. */
export interface PublicStatement {
  /** The wording for the night it describes, for a statement that follows tonight; null to keep the signed wording. */
  tonightTexts: Record<StatementLocale, string> | null;
  /** The date its shown wording counts from. */
  asOf: string;
  /** Its wording and small print as last computed: the small print is shown with wording it belongs to. */
  texts: Record<StatementLocale, string> | null;
  footnotes: Record<StatementLocale, string> | null;
  /** A phrase form ("about 2.2 billion light-years"): it reads only inside its page's sentence. */
  phrase: boolean;
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
    attributes: ['id', 'templateId', 'status', 'acknowledgedTexts', 'computedAt', 'acknowledgedAt', 'texts', 'footnotes'],
  });
  return new Map(
    rows.map((s) => {
      const follows = !!findTemplate(s.templateId)?.followsTonight && s.status === 'current' && s.acknowledgedTexts !== null;
      return [
        s.id,
        {
          tonightTexts: follows ? s.acknowledgedTexts : null,
          asOf: (follows ? s.computedAt : (s.acknowledgedAt ?? s.computedAt)).toISOString(),
          texts: s.texts ?? null,
          footnotes: s.footnotes ?? null,
          phrase: !!findTemplate(s.templateId)?.phraseOf,
        },
      ];
    }),
  );
}

/** The text to show for a statement on a published page: tonight's for one that follows tonight, else as signed. */
export function publicText(signed: string, shown: PublicStatement | undefined, locale: string): string {
  return shown?.tonightTexts?.[locale as StatementLocale] ?? signed;
}

/**
 * The small print that qualifies a statement's shown wording (which band, which cosmology, which
 * night), or null. Shown only when the wording shown is the one it was written with: a page still
 * showing older signed wording must not carry small print about a newer computation.
 * @param shownText the wording the public is shown
 * @param shown publicStatements' entry for the statement
 * @param locale the page's locale
 */
export function publicNote(shownText: string, shown: PublicStatement | undefined, locale: string): string | null {
  const l = locale as StatementLocale;
  if (!shown?.footnotes?.[l] || shown.texts?.[l] !== shownText) return null;
  return shown.footnotes[l];
}
