import { LOCALE_LABELS, STATEMENT_LOCALES } from '@shared/statements/locales.ts';
import type { StatementDto } from '@shared/schemas/statement.ts';

/**
 * The public wording in every locale. When the statement has changed, the accepted wording and the
 * new wording sit side by side so a reviewer sees exactly what would change on the pages.
 */
export function StatementTexts({ statement }: { statement: StatementDto }) {
  const changed = statement.status === 'changed' && statement.acknowledgedTexts;
  return (
    <section aria-labelledby="wording-heading" className="space-y-3">
      <h2 id="wording-heading" className="text-lg font-semibold tracking-tight">
        Public wording
      </h2>
      <div className="divide-y divide-rule rounded-lg border border-rule bg-panel">
        {STATEMENT_LOCALES.map((locale) => (
          <div key={locale} lang={locale} className="px-5 py-4">
            <p className="mb-1.5 text-xs font-semibold uppercase tracking-wide text-muted">{LOCALE_LABELS[locale]}</p>
            {changed ? (
              <div className="grid gap-4 md:grid-cols-2">
                <div>
                  <p className="mb-1 text-xs text-muted">Accepted wording (on pages now)</p>
                  <p className="font-serif text-[17px] leading-relaxed text-ink/80 line-through decoration-changed/60">
                    {statement.acknowledgedTexts?.[locale]}
                  </p>
                </div>
                <div>
                  <p className="mb-1 text-xs text-changed">New wording (needs acceptance)</p>
                  <p className="font-serif text-[17px] leading-relaxed text-ink">{statement.texts?.[locale]}</p>
                </div>
              </div>
            ) : (
              <p className="font-serif text-[17px] leading-relaxed">{statement.texts?.[locale] ?? '—'}</p>
            )}
            {statement.footnotes?.[locale] && <p className="mt-1.5 text-xs text-muted">{statement.footnotes[locale]}</p>}
          </div>
        ))}
      </div>
    </section>
  );
}
