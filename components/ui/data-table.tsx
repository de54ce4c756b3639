'use client';

import { flexRender, type Table } from '@tanstack/react-table';

export interface DataTableProps<T> {
  table: Table<T>;
  /** Accessible name of the table (read by screen readers, hidden on screen). */
  caption: string;
  className?: string;
  /** Padding of header and body cells. */
  headCellClassName?: string;
  cellClassName?: string;
}

/**
 * Renders a TanStack table: sortable columns get a header button (≥ 44 px) that says its order in
 * text as well as by arrow, and `aria-sort` for assistive technology.
 */
export function DataTable<T>({ table, caption, className = 'w-full text-left text-sm', headCellClassName = 'py-2 pr-3', cellClassName = 'py-2 pr-3' }: DataTableProps<T>) {
  return (
    <div className="overflow-x-auto">
      <table className={className}>
        <caption className="sr-only">{caption}</caption>
        <thead className="border-b border-rule text-ink-soft">
          {table.getHeaderGroups().map((hg) => (
            <tr key={hg.id}>
              {hg.headers.map((h) => {
                const sorted = h.column.getIsSorted();
                return (
                  <th key={h.id} scope="col" className={`${headCellClassName} font-medium`} aria-sort={sorted === 'asc' ? 'ascending' : sorted === 'desc' ? 'descending' : undefined}>
                    {h.column.getCanSort() ? (
                      <button type="button" className="inline-flex min-h-touch items-center gap-1 font-medium" onClick={h.column.getToggleSortingHandler()}>
                        {flexRender(h.column.columnDef.header, h.getContext())}
                        <span aria-hidden="true">{sorted === 'asc' ? '▲' : sorted === 'desc' ? '▼' : '↕'}</span>
                      </button>
                    ) : (
                      flexRender(h.column.columnDef.header, h.getContext())
                    )}
                  </th>
                );
              })}
            </tr>
          ))}
        </thead>
        <tbody>
          {table.getRowModel().rows.map((r) => (
            <tr key={r.id} className="border-b border-rule/60 align-top">
              {r.getVisibleCells().map((c) => (
                <td key={c.id} className={cellClassName}>
                  {flexRender(c.column.columnDef.cell, c.getContext())}
                </td>
              ))}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
