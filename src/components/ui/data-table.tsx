import type { ReactNode } from 'react';

/** Classes for a column (heading and cells) that a phone leaves out; its row shows the value some other way. */
export const WIDE_COLUMN = 'hidden sm:table-cell';

/** A column heading; `hidden` keeps it for screen readers only (e.g. an actions column). */
export interface DataColumn {
  label: string;
  align?: 'right';
  hidden?: boolean;
  /** Extra classes for the heading, e.g. `WIDE_COLUMN` for a column only wide screens show (its cells take the same). */
  className?: string;
}

/** What the shared table frame takes besides its columns. */
export interface DataTableProps {
  columns: DataColumn[];
  /** The table's body rows. */
  children: ReactNode;
  /** Names the table for screen readers when no heading beside it does. */
  caption?: string;
  /** Smaller type and narrower cells, for tables with many columns (rows pad their cells with px-3 to match). */
  compact?: boolean;
  /** Shown inside the frame under the table, e.g. an error about the rows or a pager. */
  footer?: ReactNode;
}

/**
 * The frame every staff table shares: dense but calm rows, a sticky header, tabular figures.
 * Children are the table's body rows.
 */
export function DataTable({ columns, children, caption, compact = false, footer }: DataTableProps) {
  const cell = compact ? 'px-3' : 'px-4';
  return (
    <div className="overflow-hidden rounded-lg border border-rule bg-panel">
      <div className="overflow-x-auto">
        <table className={`w-full text-left ${compact ? 'text-[13px] leading-snug' : 'text-sm'}`}>
          {caption && <caption className="sr-only">{caption}</caption>}
          <thead className="sticky top-0 border-b border-rule bg-wash text-xs uppercase tracking-wide text-muted">
            <tr>
              {columns.map((c) => (
                <th
                  key={c.label}
                  scope="col"
                  className={`${cell} py-2.5 font-semibold ${c.align === 'right' ? 'text-right' : ''} ${c.className ?? ''}`}
                >
                  {c.hidden ? <span className="sr-only">{c.label}</span> : c.label}
                </th>
              ))}
            </tr>
          </thead>
          <tbody>{children}</tbody>
        </table>
      </div>
      {footer}
    </div>
  );
}
