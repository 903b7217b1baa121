import { flexRender, getCoreRowModel, useReactTable, type ColumnDef, type SortingState } from '@tanstack/react-table';
import { useMemo } from 'react';
import { Link } from 'react-router-dom';
import { KIND_LABELS } from '@shared/catalogue/kinds.ts';
import type { SkyObjectListQuery, SkyObjectRowDto } from '@shared/schemas/sky-object.ts';
import { Button } from '@/components/ui/button.tsx';
import { WIDE_COLUMN } from '@/components/ui/data-table.tsx';
import { paths } from '@/config/paths.ts';
import { constellationName, formatPosition } from './format.ts';

type SortKey = SkyObjectListQuery['sort'];

const columns: ColumnDef<SkyObjectRowDto>[] = [
  {
    id: 'name',
    header: 'Name',
    // Accessors make the columns sortable for the table; the server does the sorting.
    accessorFn: (r) => r.name,
    cell: ({ row }) => (
      // A long unbroken name or designation wraps anywhere rather than widening the column past a phone.
      <div className="[overflow-wrap:anywhere]">
        <Link to={paths.catalogueObject.href(row.original.id)} className="font-medium text-accent hover:underline">
          {row.original.name}
        </Link>
        {row.original.designations.length > 0 && (
          <span className="block text-xs text-muted">{row.original.designations.slice(0, 3).join(' · ')}</span>
        )}
        {/* On a phone the kind and constellation columns give way; they are read here instead. */}
        <span className="block text-xs text-muted sm:hidden">
          {[KIND_LABELS[row.original.kind], row.original.constellation && constellationName(row.original.constellation)]
            .filter(Boolean)
            .join(' · ')}
        </span>
      </div>
    ),
  },
  { id: 'kind', header: 'Kind', accessorFn: (r) => r.kind, cell: ({ row }) => KIND_LABELS[row.original.kind] },
  {
    id: 'ra',
    header: 'Position (J2000)',
    accessorFn: (r) => r.raDeg,
    cell: ({ row }) => (
      <span className="whitespace-pre font-mono text-xs tabular-nums">
        {formatPosition(row.original.raDeg, row.original.decDeg)}
      </span>
    ),
  },
  {
    id: 'constellation',
    header: 'Constellation',
    accessorFn: (r) => r.constellation,
    cell: ({ row }) => constellationName(row.original.constellation),
  },
  {
    id: 'measurements',
    header: 'Measurements',
    enableSorting: false,
    cell: ({ row }) => (
      <span className="tabular-nums">
        {row.original.measurementCount} <span className="text-muted">· {row.original.preferredCount} preferred</span>
        {row.original.proposedCount > 0 && <span className="ml-1 text-changed">· {row.original.proposedCount} proposed</span>}
      </span>
    ),
  },
];

/** Columns a narrow screen leaves out (the name cell repeats the kind and constellation there). */
const WIDE_ONLY: Record<string, string> = {
  kind: WIDE_COLUMN,
  ra: 'hidden md:table-cell',
  constellation: WIDE_COLUMN,
};

interface Props {
  rows: SkyObjectRowDto[];
  total: number;
  /** False when the total is the database's estimate (large catalogues): shown as "about N". */
  totalExact: boolean;
  page: number;
  pageSize: number;
  sort: SortKey;
  dir: 'asc' | 'desc';
  loading: boolean;
  onSort: (sort: SortKey, dir: 'asc' | 'desc') => void;
  onPage: (page: number) => void;
}

/** The catalogue as a dense table; sorting and paging happen on the server. */
export function CatalogueTable({ rows, total, totalExact, page, pageSize, sort, dir, loading, onSort, onPage }: Props) {
  const sorting = useMemo<SortingState>(() => [{ id: sort, desc: dir === 'desc' }], [sort, dir]);
  const pageCount = Math.max(1, Math.ceil(total / pageSize));
  const table = useReactTable({
    data: rows,
    columns,
    state: { sorting, pagination: { pageIndex: page - 1, pageSize } },
    manualSorting: true,
    manualPagination: true,
    pageCount,
    enableSortingRemoval: false,
    getCoreRowModel: getCoreRowModel(),
    onSortingChange: (updater) => {
      const next = typeof updater === 'function' ? updater(sorting) : updater;
      if (next[0]) onSort(next[0].id as SortKey, next[0].desc ? 'desc' : 'asc');
    },
  });
  const first = total === 0 ? 0 : (page - 1) * pageSize + 1;
  return (
    <div className="rounded-lg border border-rule bg-panel" aria-busy={loading || undefined}>
      <div className="overflow-x-auto">
        <table className="w-full text-left text-sm">
          <thead className="sticky top-0 border-b border-rule bg-wash text-xs uppercase tracking-wide text-muted">
            {table.getHeaderGroups().map((group) => (
              <tr key={group.id}>
                {group.headers.map((header) => {
                  const sorted = header.column.getIsSorted();
                  return (
                    <th
                      key={header.id}
                      scope="col"
                      className={`px-4 py-2.5 font-semibold ${WIDE_ONLY[header.column.id] ?? ''}`}
                      aria-sort={sorted ? (sorted === 'asc' ? 'ascending' : 'descending') : undefined}
                    >
                      {header.column.getCanSort() ? (
                        <button
                          type="button"
                          onClick={header.column.getToggleSortingHandler()}
                          className="inline-flex items-center gap-1 uppercase hover:text-ink"
                        >
                          {flexRender(header.column.columnDef.header, header.getContext())}
                          <span aria-hidden="true">{sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}</span>
                        </button>
                      ) : (
                        flexRender(header.column.columnDef.header, header.getContext())
                      )}
                    </th>
                  );
                })}
              </tr>
            ))}
          </thead>
          <tbody>
            {table.getRowModel().rows.map((row) => (
              <tr key={row.id} className="h-10 border-b border-rule last:border-0">
                {row.getVisibleCells().map((cell) => (
                  <td key={cell.id} className={`px-4 py-1.5 align-middle ${WIDE_ONLY[cell.column.id] ?? ''}`}>
                    {flexRender(cell.column.columnDef.cell, cell.getContext())}
                  </td>
                ))}
              </tr>
            ))}
            {rows.length === 0 && (
              <tr>
                <td colSpan={columns.length} className="px-4 py-8 text-center text-muted">
                  No objects match these filters.
                </td>
              </tr>
            )}
          </tbody>
        </table>
      </div>
      <nav aria-label="Pages" className="flex items-center justify-between gap-3 border-t border-rule px-4 py-2 text-sm">
        <span className="tabular-nums text-muted">
          {first}–{totalExact ? Math.min(total, page * pageSize) : (page - 1) * pageSize + rows.length} of{' '}
          {totalExact ? '' : 'about '}
          {total.toLocaleString()} objects
        </span>
        <div className="flex items-center gap-2">
          <Button variant="secondary" onClick={() => onPage(page - 1)} disabled={page <= 1}>
            Previous
          </Button>
          <span className="tabular-nums">
            Page {page} of {totalExact ? '' : 'about '}
            {pageCount.toLocaleString()}
          </span>
          <Button
            variant="secondary"
            onClick={() => onPage(page + 1)}
            disabled={totalExact ? page >= pageCount : rows.length < pageSize}
          >
            Next
          </Button>
        </div>
      </nav>
    </div>
  );
}
