import { useState } from 'react';
import { useLocation } from 'react-router-dom';
import { type PageFilters, usePages } from '@/api/pages.ts';
import { useSettings } from '@/api/settings.ts';
import { useFormOpener } from '@/lib/use-form-opener.ts';
import { PAGE_STATUSES, PAGE_STATUS_LABELS, type PageStatus } from '@shared/schemas/page.ts';
import type { StatementLocale } from '@shared/statements/locales.ts';
import { Button } from '@/components/ui/button.tsx';
import { SelectField, TextField } from '@/components/ui/field.tsx';
import { Icon } from '@/components/ui/icon.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { NewPageForm } from '@/features/pages/components/new-page-form.tsx';
import { PagesTable } from '@/features/pages/components/pages-table.tsx';
import { useCurrentUser } from '@/lib/auth.tsx';

/** Every page the viewer may see, filtered by status, writer and title; and "New page". */
export function Component() {
  const user = useCurrentUser();
  const settings = useSettings();
  const [filters, setFilters] = useState<PageFilters>({});
  const creating = useFormOpener();
  const pages = usePages(filters);
  const canCreate = user.role !== 'reviewer';
  const deleted = (useLocation().state as { deleted?: string } | null)?.deleted;
  return (
    <>
      <PageHeader
        title="Pages"
        description="Object pages, from draft to published. Numbers on them come from checked statements."
        actions={
          canCreate && !creating.open ? (
            <Button ref={creating.openerRef} onClick={creating.show}>
              <Icon name="plus" className="size-4" />
              New page
            </Button>
          ) : undefined
        }
      />
      {deleted && (
        <div className="mb-4">
          <Notice tone="success" title="Page deleted">
            “{deleted}” was deleted for good. The reason is kept in the audit log.
          </Notice>
        </div>
      )}
      {creating.open && (
        <div className="mb-6">
          <NewPageForm defaultLocale={(settings.data?.defaultLocale ?? 'en-GB') as StatementLocale} onCancel={creating.close} />
        </div>
      )}
      <div className="mb-4 flex flex-wrap items-end gap-3">
        <SelectField
          label="Status"
          className="w-48"
          value={filters.status ?? ''}
          onChange={(e) => setFilters({ ...filters, status: (e.target.value || undefined) as PageStatus | undefined, page: 1 })}
        >
          <option value="">Any status</option>
          {PAGE_STATUSES.map((s) => (
            <option key={s} value={s}>
              {PAGE_STATUS_LABELS[s]}
            </option>
          ))}
        </SelectField>
        <SelectField
          label="Writer"
          className="w-48"
          value={filters.writerId ?? ''}
          onChange={(e) => setFilters({ ...filters, writerId: e.target.value || undefined, page: 1 })}
        >
          <option value="">Anyone</option>
          <option value={user.id}>Me</option>
        </SelectField>
        <TextField
          label="Title contains"
          className="w-64"
          type="search"
          value={filters.q ?? ''}
          onChange={(e) => setFilters({ ...filters, q: e.target.value || undefined, page: 1 })}
        />
        <SelectField
          label="Archived pages"
          className="w-48"
          value={filters.archived ?? ''}
          onChange={(e) =>
            setFilters({ ...filters, archived: (e.target.value || undefined) as PageFilters['archived'], page: 1 })
          }
        >
          <option value="">Hide archived</option>
          <option value="include">Show archived</option>
          <option value="only">Only archived</option>
        </SelectField>
      </div>
      {pages.error && <Notice tone="error">{pages.error.message}</Notice>}
      {pages.data &&
        (pages.data.data.length ? (
          <PagesTable rows={pages.data.data} />
        ) : (
          <p className="rounded-lg border border-dashed border-rule p-8 text-center text-sm text-muted">
            No pages match these filters.
          </p>
        ))}
      {pages.data && pages.data.meta.total > pages.data.meta.pageSize && (
        <div className="mt-3 flex items-center gap-3 text-sm text-muted">
          <Button
            variant="secondary"
            disabled={(filters.page ?? 1) <= 1}
            onClick={() => setFilters({ ...filters, page: (filters.page ?? 1) - 1 })}
          >
            Previous
          </Button>
          Page {pages.data.meta.page} of {Math.ceil(pages.data.meta.total / pages.data.meta.pageSize)}
          <Button
            variant="secondary"
            disabled={pages.data.meta.page * pages.data.meta.pageSize >= pages.data.meta.total}
            onClick={() => setFilters({ ...filters, page: (filters.page ?? 1) + 1 })}
          >
            Next
          </Button>
        </div>
      )}
    </>
  );
}
