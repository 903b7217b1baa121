import type { ReactNode } from 'react';

/** A column heading; `hidden` keeps it for screen readers only (e.g. an actions column). */
export interface DataColumn {
  label: string;
  align?: 'right';
  hidden?: boolean;
}

/**
 * The frame every staff table shares: dense but calm rows, a sticky header, tabular figures.
 * Children are the table's body rows.
 */
export function DataTable({ columns, children }: { columns: DataColumn[]; children: ReactNode }) {
  return (
    <div className="overflow-x-auto rounded-lg border border-rule bg-panel">
      <table className="w-full text-left text-sm">
        <thead className="sticky top-0 border-b border-rule bg-wash text-xs uppercase tracking-wide text-muted">
          <tr>
            {columns.map((c) => (
              <th key={c.label} scope="col" className={`px-4 py-2.5 font-semibold ${c.align === 'right' ? 'text-right' : ''}`}>
                {c.hidden ? <span className="sr-only">{c.label}</span> : c.label}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>{children}</tbody>
      </table>
    </div>
  );
}
