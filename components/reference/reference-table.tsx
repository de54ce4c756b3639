'use client';

import {
  type ColumnFiltersState,
  createColumnHelper,
  getCoreRowModel,
  getFilteredRowModel,
  getPaginationRowModel,
  getSortedRowModel,
  type SortingState,
  useReactTable,
} from '@tanstack/react-table';
import Link from 'next/link';
import { useId, useMemo, useState } from 'react';
import { PROPERTIES, PROPERTY_CODES, type ReferenceValue } from '@/lib/reference/properties';
import { DataTable } from '@/components/ui/data-table';
import { historyHref, propertyLabel, qualifiers } from './format';

export interface ReferenceTableProps {
  values: ReferenceValue[];
  /** Accessible name of the table, e.g. "Values of edition No. 2". */
  caption: string;
  /** Show a link to each value's history across editions. */
  historyLinks?: boolean;
  pageSize?: number;
  /** In a draft: an "Edit" button per row hands the value to the editor. */
  onEdit?: (value: ReferenceValue) => void;
}

const col = createColumnHelper<ReferenceValue>();

export function ReferenceTable({ values, caption, historyLinks = true, pageSize = 50, onEdit }: ReferenceTableProps) {
  const id = useId();
  const [search, setSearch] = useState('');
  const [sorting, setSorting] = useState<SortingState>([]);
  const [columnFilters, setColumnFilters] = useState<ColumnFiltersState>([]);
  const [pagination, setPagination] = useState({ pageIndex: 0, pageSize });

  const columns = useMemo(
    () => [
      col.accessor('species', {
        header: 'Species',
        cell: (c) => (
          <span className="whitespace-nowrap font-medium">
            {c.getValue()} <span className="text-ink-soft">({c.row.original.phase})</span>
          </span>
        ),
        filterFn: (row, _col, wanted: string) => row.original.species.toLowerCase().startsWith(wanted.toLowerCase()),
      }),
      col.accessor('property', {
        header: 'Property',
        cell: (c) => (
          <span>
            {propertyLabel(c.getValue())}
            {qualifiers(c.row.original) ? <span className="block text-xs text-ink-soft">{qualifiers(c.row.original)}</span> : null}
          </span>
        ),
        filterFn: 'equals',
      }),
      col.accessor((v) => Number(v.value), {
        id: 'value',
        header: 'Value',
        sortDescFirst: false,
        cell: (c) => (
          <span className="whitespace-nowrap tabular-nums">
            {c.row.original.value}
            {c.row.original.uncertainty ? <span className="text-ink-soft"> ± {c.row.original.uncertainty}</span> : null}{' '}
            <span className="text-ink-soft">{c.row.original.unit === '1' ? '' : c.row.original.unit}</span>
          </span>
        ),
      }),
      col.accessor('source', {
        header: 'Source',
        enableSorting: false,
        cell: (c) => {
          const v = c.row.original;
          return (
            <span className="block max-w-xs text-xs text-ink-soft">
              {v.fromMemory ? <strong className="mr-1 rounded border border-ember-500 px-1 text-ember-700">from memory</strong> : null}
              <span className="line-clamp-2" title={v.source || v.note}>
                {v.source || v.note}
              </span>
            </span>
          );
        },
      }),
      ...(historyLinks
        ? [
            col.display({
              id: 'history',
              header: () => <span className="sr-only">History</span>,
              cell: (c) => (
                <Link
                  href={historyHref(c.row.original)}
                  className="btn-quiet px-2 text-xs"
                  aria-label={`History of ${c.row.original.species} (${c.row.original.phase}) ${propertyLabel(c.row.original.property)}${c.row.original.coordination != null ? ` CN ${c.row.original.coordination}` : ''}`}
                >
                  History
                </Link>
              ),
            }),
          ]
        : []),
      ...(onEdit
        ? [
            col.display({
              id: 'edit',
              header: () => <span className="sr-only">Edit</span>,
              cell: (c) => (
                <button
                  type="button"
                  className="btn-quiet px-2 text-xs"
                  onClick={() => onEdit(c.row.original)}
                  aria-label={`Edit ${c.row.original.species} (${c.row.original.phase}) ${propertyLabel(c.row.original.property)}${c.row.original.coordination != null ? ` CN ${c.row.original.coordination}` : ''}`}
                >
                  Edit
                </button>
              ),
            }),
          ]
        : []),
    ],
    [historyLinks, onEdit],
  );

  const table = useReactTable({
    data: values,
    columns,
    state: { globalFilter: search, sorting, columnFilters, pagination },
    onGlobalFilterChange: setSearch,
    onSortingChange: setSorting,
    onColumnFiltersChange: setColumnFilters,
    onPaginationChange: setPagination,
    globalFilterFn: (row, _col, wanted: string) => {
      const v = row.original;
      const hay = `${v.species} ${v.phase} ${v.property} ${propertyLabel(v.property)} ${v.value} ${v.source} ${v.note ?? ''} ${qualifiers(v)}`.toLowerCase();
      return wanted
        .toLowerCase()
        .split(/\s+/)
        .every((w) => hay.includes(w));
    },
    getCoreRowModel: getCoreRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getSortedRowModel: getSortedRowModel(),
    getPaginationRowModel: getPaginationRowModel(),
    autoResetPageIndex: true,
  });

  const propertyFilter = (table.getColumn('property')?.getFilterValue() as string | undefined) ?? '';
  const speciesFilter = (table.getColumn('species')?.getFilterValue() as string | undefined) ?? '';
  const shown = table.getFilteredRowModel().rows.length;
  const { pageIndex } = table.getState().pagination;

  return (
    <div className="space-y-3">
      <div className="grid gap-3 sm:grid-cols-3">
        <div>
          <label htmlFor={`${id}-search`} className="field-label">
            Search
          </label>
          <input id={`${id}-search`} type="search" className="field-input" value={search} onChange={(e) => setSearch(e.target.value)} placeholder="e.g. CaCl2 formation" />
        </div>
        <div>
          <label htmlFor={`${id}-property`} className="field-label">
            Property
          </label>
          <select id={`${id}-property`} className="field-input" value={propertyFilter} onChange={(e) => table.getColumn('property')?.setFilterValue(e.target.value || undefined)}>
            <option value="">All properties</option>
            {PROPERTY_CODES.map((code) => (
              <option key={code} value={code}>
                {PROPERTIES[code].label}
              </option>
            ))}
          </select>
        </div>
        <div>
          <label htmlFor={`${id}-species`} className="field-label">
            Species starts with
          </label>
          <input id={`${id}-species`} className="field-input" value={speciesFilter} onChange={(e) => table.getColumn('species')?.setFilterValue(e.target.value || undefined)} placeholder="e.g. Ca" />
        </div>
      </div>
      <p role="status" className="text-sm text-ink-soft">
        {shown} of {values.length} values
      </p>
      <DataTable table={table} caption={caption} />
      <nav aria-label={`Pages of ${caption}`} className="flex flex-wrap items-center gap-2">
        <button type="button" className="btn-quiet" onClick={() => table.previousPage()} disabled={!table.getCanPreviousPage()}>
          Previous page
        </button>
        <span className="text-sm text-ink-soft">
          Page {pageIndex + 1} of {Math.max(table.getPageCount(), 1)}
        </span>
        <button type="button" className="btn-quiet" onClick={() => table.nextPage()} disabled={!table.getCanNextPage()}>
          Next page
        </button>
      </nav>
    </div>
  );
}
