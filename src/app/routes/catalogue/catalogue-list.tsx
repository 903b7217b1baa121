import { useEffect, useState } from 'react';
import { type CatalogueQuery, useSkyObjects } from '@/api/catalogue-objects.ts';
import { useFormOpener } from '@/lib/use-form-opener.ts';
import { Link, useNavigate, useSearchParams } from 'react-router-dom';
import { KIND_LABELS, SKY_OBJECT_KINDS } from '@shared/catalogue/kinds.ts';
import { QUANTITIES, QUANTITY_IDS } from '@shared/catalogue/quantities.ts';
import { MISSING_FILTERS, SKY_OBJECT_SORTS, type SkyObjectListQuery } from '@shared/schemas/sky-object.ts';
import { Button } from '@/components/ui/button.tsx';
import { Icon } from '@/components/ui/icon.tsx';
import { Notice } from '@/components/ui/notice.tsx';
import { PageHeader } from '@/components/ui/page-header.tsx';
import { paths } from '@/config/paths.ts';
import { CatalogueTable } from '@/features/catalogue/components/catalogue-table.tsx';
import { ObjectForm } from '@/features/catalogue/components/object-form.tsx';
import { ProposalList } from '@/features/catalogue/components/proposal-list.tsx';
import { useCurrentUser } from '@/lib/auth.tsx';
import { searchParams } from '@/lib/query-string.ts';
import { useDebouncedValue } from '@/lib/use-debounced-value.ts';

const MISSING_LABELS: Record<(typeof MISSING_FILTERS)[number], string> = {
  any_preferred: 'No preferred value at all',
  position: 'No position',
  source: 'A measurement without a source',
  ...(Object.fromEntries(QUANTITY_IDS.map((id) => [id, `No preferred ${QUANTITIES[id].label.toLowerCase()}`])) as Record<
    (typeof QUANTITY_IDS)[number],
    string
  >),
};

const pick = <T extends string>(value: string | null, allowed: readonly T[]): T | undefined =>
  (allowed as readonly string[]).includes(value ?? '') ? (value as T) : undefined;

/** Reads the table's state from the URL, so a filtered view can be bookmarked and shared. */
function useCatalogueQuery(): [CatalogueQuery, (patch: Partial<CatalogueQuery>) => void] {
  const [params, setParams] = useSearchParams();
  const query: CatalogueQuery = {
    q: params.get('q') ?? undefined,
    kind: pick(params.get('kind'), SKY_OBJECT_KINDS),
    missing: pick(params.get('missing'), MISSING_FILTERS),
    sort: pick(params.get('sort'), SKY_OBJECT_SORTS) ?? 'name',
    dir: params.get('dir') === 'desc' ? 'desc' : 'asc',
    page: Math.max(1, Number(params.get('page')) || 1),
    pageSize: 50,
    after: params.get('after') ?? undefined,
  };
  // Any change but "next page" drops the keyset cursor (it belongs to one filter, sort and page).
  const update = (patch: Partial<CatalogueQuery>) => {
    // The page size is fixed, so the URL leaves it out.
    setParams(searchParams({ ...query, page: 1, after: undefined, ...patch, pageSize: undefined }), { replace: true });
  };
  return [query, update];
}

export function Component() {
  const user = useCurrentUser();
  const navigate = useNavigate();
  const [query, update] = useCatalogueQuery();
  const [search, setSearch] = useState(query.q ?? '');
  const adding = useFormOpener();
  const objects = useSkyObjects(query);
  const keeper = user.role === 'reviewer' || user.role === 'admin';
  const [proposed, setProposed] = useState<string | null>(null);

  // Searching waits for a pause in typing rather than asking the server at every key.
  const settledSearch = useDebouncedValue(search, 300);
  useEffect(() => {
    if ((query.q ?? '') !== settledSearch) update({ q: settledSearch || undefined });
  }, [query.q, settledSearch, update]);

  return (
    <>
      <PageHeader
        title="Catalogue"
        description="Objects and their sourced measurements. Statements use each object's preferred values."
        actions={
          <>
            <a
              href="/api/catalogue/exports/measurements.csv"
              className="inline-flex items-center rounded-md border border-rule bg-panel px-3.5 py-2 text-sm font-medium hover:border-accent"
            >
              Export CSV
            </a>
            {keeper && (
              <Link
                to={paths.catalogueImport.href()}
                className="inline-flex items-center gap-2 rounded-md border border-rule bg-panel px-3.5 py-2 text-sm font-medium hover:border-accent"
              >
                <Icon name="upload" className="size-4" />
                Import CSV
              </Link>
            )}
            {!adding.open && (
              <Button
                ref={adding.openerRef}
                onClick={() => {
                  setProposed(null);
                  adding.show();
                }}
              >
                <Icon name="plus" className="size-4" />
                {keeper ? 'Add object' : 'Propose an object'}
              </Button>
            )}
          </>
        }
      />
      <div className="space-y-4">
        {!keeper && (
          <p className="text-sm text-muted">
            Reviewers and admins add objects and import CSV files. As {user.role === 'editor' ? 'an editor' : 'a writer'}, you
            propose an object with the source it comes from, and a reviewer accepts or declines it.
          </p>
        )}
        {proposed && (
          <Notice tone="success" title="Proposed">
            “{proposed}” is waiting for a reviewer. It joins the catalogue when a reviewer or an admin accepts it.
          </Notice>
        )}
        {adding.open && (
          <ObjectForm
            onDone={(o) => navigate(paths.catalogueObject.href(o.id))}
            onProposed={
              keeper
                ? undefined
                : (title) => {
                    setProposed(title);
                    adding.close();
                  }
            }
            onCancel={adding.close}
          />
        )}
        <ProposalList kind="object" reviewer={keeper} />
        <search className="flex flex-wrap items-end gap-3" aria-label="Filter the catalogue">
          <label className="text-sm">
            <span className="mb-1 block font-medium">Search</span>
            <input
              type="search"
              value={search}
              onChange={(e) => setSearch(e.target.value)}
              placeholder="Name or designation"
              className="w-64 rounded-md border border-rule bg-panel px-3 py-2"
            />
          </label>
          <label className="text-sm">
            <span className="mb-1 block font-medium">Kind</span>
            <select
              value={query.kind ?? ''}
              onChange={(e) => update({ kind: (e.target.value || undefined) as SkyObjectListQuery['kind'] })}
              className="rounded-md border border-rule bg-panel px-3 py-2"
            >
              <option value="">All kinds</option>
              {SKY_OBJECT_KINDS.map((k) => (
                <option key={k} value={k}>
                  {KIND_LABELS[k]}
                </option>
              ))}
            </select>
          </label>
          <label className="text-sm">
            <span className="mb-1 block font-medium">Missing data</span>
            <select
              value={query.missing ?? ''}
              onChange={(e) => update({ missing: (e.target.value || undefined) as SkyObjectListQuery['missing'] })}
              className="rounded-md border border-rule bg-panel px-3 py-2"
            >
              <option value="">Any</option>
              {MISSING_FILTERS.map((m) => (
                <option key={m} value={m}>
                  {MISSING_LABELS[m]}
                </option>
              ))}
            </select>
          </label>
        </search>
        {objects.error && <Notice tone="error">{objects.error.message}</Notice>}
        {objects.isPending && <p className="text-sm text-muted">Loading the catalogue…</p>}
        {objects.data && (
          <CatalogueTable
            {...objects.data}
            sort={query.sort}
            dir={query.dir}
            loading={objects.isFetching}
            onSort={(sort, dir) => update({ sort, dir })}
            onPage={(page) =>
              update({ page, after: page === query.page + 1 ? (objects.data?.nextAfter ?? undefined) : undefined })
            }
          />
        )}
      </div>
    </>
  );
}
