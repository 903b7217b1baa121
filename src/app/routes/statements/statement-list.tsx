import { useSearchParams } from 'react-router-dom';
import { STATEMENT_STATUS_LABELS, STATEMENT_STATUSES, type StatementStatusValue } from '@shared/schemas/statement.ts';
import type { StatementLocale } from '@shared/statements/locales.ts';
import { useSettings } from '@/api/settings.ts';
import { useStatements, useStatementTemplates } from '@/api/statements.ts';
import { Button } from '@/components/ui/button.tsx';
import { SelectField } from '@/components/ui/field.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { StatementsTable } from '@/features/statements/components/statements-table.tsx';

/** Every checked statement, those needing attention first; filter by status, template and object. */
export function Component() {
  const [params, setParams] = useSearchParams();
  const filters = {
    status: (params.get('status') || undefined) as StatementStatusValue | undefined,
    templateId: params.get('template') || undefined,
    objectId: params.get('object') || undefined,
    page: Number(params.get('page') ?? 1),
  };
  const statements = useStatements(filters);
  const templates = useStatementTemplates();
  const settings = useSettings();
  const locale = (settings.data?.defaultLocale ?? 'en-GB') as StatementLocale;
  const set = (key: string, value: string) => {
    const next = new URLSearchParams(params);
    if (value) next.set(key, value);
    else next.delete(key);
    if (key !== 'page') next.delete('page');
    setParams(next);
  };
  const meta = statements.data?.meta;
  const pages = meta ? Math.max(1, Math.ceil(meta.total / meta.pageSize)) : 1;

  return (
    <>
      <PageHeader
        title="Statements"
        description={`Sentences with numbers worked out from the catalogue${settings.data ? ` and the ${settings.data.cosmologyLabel} cosmology` : ''}. Changed and broken ones come first.`}
      />
      <div className="mb-4 flex flex-wrap items-end gap-3">
        <SelectField label="Status" value={filters.status ?? ''} onChange={(e) => set('status', e.target.value)} className="w-44">
          <option value="">Any status</option>
          {STATEMENT_STATUSES.map((s) => (
            <option key={s} value={s}>
              {STATEMENT_STATUS_LABELS[s]}
            </option>
          ))}
        </SelectField>
        <SelectField
          label="Template"
          value={filters.templateId ?? ''}
          onChange={(e) => set('template', e.target.value)}
          className="w-80"
        >
          <option value="">Any template</option>
          {templates.data?.map((t) => (
            <option key={t.id} value={t.id}>
              {t.title}
            </option>
          ))}
        </SelectField>
        {filters.objectId && (
          <Button variant="secondary" onClick={() => set('object', '')}>
            Show every object
          </Button>
        )}
      </div>
      {statements.error && <Notice tone="error">{statements.error.message}</Notice>}
      {statements.isPending && <p className="text-sm text-muted">Loading statements…</p>}
      {statements.data && statements.data.data.length === 0 && (
        <Notice>No statements match. Writers add statements from an object’s page in the catalogue.</Notice>
      )}
      {statements.data && statements.data.data.length > 0 && (
        <StatementsTable statements={statements.data.data} locale={locale} />
      )}
      {meta && pages > 1 && (
        <nav aria-label="Pages" className="mt-4 flex items-center gap-3 text-sm">
          <Button variant="secondary" disabled={filters.page <= 1} onClick={() => set('page', String(filters.page - 1))}>
            Previous
          </Button>
          <span className="text-muted">
            Page {filters.page} of {pages} · {meta.total} statements
          </span>
          <Button variant="secondary" disabled={filters.page >= pages} onClick={() => set('page', String(filters.page + 1))}>
            Next
          </Button>
        </nav>
      )}
    </>
  );
}
