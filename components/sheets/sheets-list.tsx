'use client';
// The sheets of the site on this device (TanStack Table): search, filter by type, status, author
// and lot, sort; open, duplicate, delete (a tombstone). Reads the local store, online or offline.
import {
  createColumnHelper,
  getCoreRowModel,
  getFilteredRowModel,
  getSortedRowModel,
  useReactTable,
  type ColumnFiltersState,
  type SortingState,
} from '@tanstack/react-table';
import Link from 'next/link';
import { useEffect, useMemo, useState } from 'react';
import { warmOfflinePages } from '@/components/pwa/sw-messages';
import { DataTable } from '@/components/ui/data-table';
import { deleteSheet, newSheet, saveSheet, syncNow, useSheets, type LocalRecord, type Sheet } from '@/lib/local';
import { SHEET_KINDS, SHEET_STATUSES } from '@/lib/sheets/sheet-schema';
import { mayEdit, KIND_TEXT, STATUS_TEXT } from '@/lib/workbench/sheet-rules';
import { sheetHeadline, sheetSearchText, sheetSubject } from '@/lib/workbench/sheet-summary';
import { useUnit } from './use-unit';
import { useWorkbenchStore } from './use-workbench-store';
import type { WorkbenchContext } from './workbench-context';

export interface SheetsListProps {
  ctx: WorkbenchContext;
}

interface Row {
  record: LocalRecord<Sheet>;
  sheet: Sheet;
  subject: string;
  headline: string;
  author: string;
  search: string;
}

const col = createColumnHelper<Row>();

export function SheetsList({ ctx }: SheetsListProps) {
  const { ready } = useWorkbenchStore(ctx.identity);
  const records = useSheets();
  const [unit] = useUnit(ctx.identity.userId, ctx.preferredUnit);
  const [search, setSearch] = useState('');
  const [filters, setFilters] = useState<ColumnFiltersState>([]);
  const [sorting, setSorting] = useState<SortingState>([{ id: 'updated', desc: true }]);
  const [message, setMessage] = useState<string | null>(null);
  const names = useMemo(() => new Map(ctx.people.map((p) => [p.id, p.displayName])), [ctx.people]);

  useEffect(() => {
    // Keep the workbench page on this device too, so a new sheet can be started offline.
    void warmOfflinePages(ctx.identity.userId, ['/sheets/new']);
  }, [ctx.identity.userId]);

  const rows = useMemo<Row[]>(
    () =>
      (records ?? []).map((record) => ({
        record,
        sheet: record.content,
        subject: sheetSubject(record.content),
        headline: sheetHeadline(record.content, unit),
        author: names.get(record.content.authorId) ?? 'another user',
        search: sheetSearchText(record.content),
      })),
    [records, unit, names],
  );

  const columns = useMemo(
    () => [
      col.accessor((r) => r.sheet.title, {
        id: 'title',
        header: 'Title',
        cell: (c) => (
          <Link href={`/sheets/open?id=${c.row.original.sheet.id}`} className="inline-flex min-h-touch items-center font-medium text-verdigris-700 underline-offset-2 hover:underline">
            {c.getValue()}
          </Link>
        ),
      }),
      col.accessor((r) => r.sheet.kind, { id: 'kind', header: 'Type', cell: (c) => KIND_TEXT[c.getValue()], filterFn: 'equals' }),
      col.accessor('subject', { header: 'Subject', cell: (c) => <span className="font-medium">{c.getValue()}</span> }),
      col.accessor('headline', { header: 'Result', enableSorting: false, cell: (c) => <span className="tabular-nums">{c.getValue() || '—'}</span> }),
      col.accessor((r) => r.sheet.lotRef ?? '', { id: 'lot', header: 'Lot', filterFn: 'includesString' }),
      col.accessor((r) => r.sheet.authorId, { id: 'author', header: 'Author', cell: (c) => c.row.original.author, filterFn: 'equals' }),
      col.accessor((r) => r.sheet.status, {
        id: 'status',
        header: 'Status',
        filterFn: 'equals',
        cell: (c) => (
          <span>
            {STATUS_TEXT[c.getValue()]}
            {c.row.original.record.pending ? <span className="block text-xs text-ink-soft">waiting to sync</span> : null}
          </span>
        ),
      }),
      col.accessor((r) => r.sheet.updatedAt, { id: 'updated', header: 'Changed', cell: (c) => new Date(c.getValue()).toLocaleString() }),
      col.display({
        id: 'actions',
        header: () => <span className="sr-only">Actions</span>,
        cell: (c) => {
          const s = c.row.original.sheet;
          const canDelete = mayEdit(s, ctx.identity).ok;
          return (
            <div className="flex justify-end gap-2">
              <button type="button" className="btn-quiet" onClick={() => void duplicate(s)} aria-label={`Duplicate ${s.title}`}>
                Duplicate
              </button>
              {canDelete ? (
                <button type="button" className="btn-danger" onClick={() => void remove(s)} aria-label={`Delete ${s.title}`}>
                  Delete
                </button>
              ) : null}
            </div>
          );
        },
      }),
    ],
    [ctx.identity],
  );

  async function duplicate(s: Sheet) {
    const copy = newSheet({ kind: s.kind, title: `${s.title} (copy)`.slice(0, 200), lotRef: s.lotRef, areaId: s.areaId, note: s.note, problem: s.problem, inputs: s.inputs, result: s.result, pinnedEditionId: s.pinnedEditionId, engineVersion: s.engineVersion });
    await saveSheet(copy);
    setMessage(`Duplicated as “${copy.title}” (a new draft).`);
    if (navigator.onLine) void syncNow();
  }
  async function remove(s: Sheet) {
    if (!window.confirm(`Delete “${s.title}”? It is kept as a deleted record and synced.`)) return;
    await deleteSheet(s.id);
    setMessage(`Deleted “${s.title}”.`);
    if (navigator.onLine) void syncNow();
  }

  const table = useReactTable({
    data: rows,
    columns,
    state: { globalFilter: search, columnFilters: filters, sorting },
    onGlobalFilterChange: setSearch,
    onColumnFiltersChange: setFilters,
    onSortingChange: setSorting,
    globalFilterFn: (row, _id, value: string) => row.original.search.includes(String(value).toLowerCase().trim()),
    getCoreRowModel: getCoreRowModel(),
    getFilteredRowModel: getFilteredRowModel(),
    getSortedRowModel: getSortedRowModel(),
  });
  const setFilter = (id: string, value: string) => setFilters((f) => [...f.filter((x) => x.id !== id), ...(value ? [{ id, value }] : [])]);
  const filterValue = (id: string) => (filters.find((f) => f.id === id)?.value as string | undefined) ?? '';

  return (
    <div className="space-y-6">
      <div>
        <h1>Sheets</h1>
        <p className="text-sm text-ink-soft">Saved calculations of the site on this device: lattice cycles, dissolution and batch heat, reactions and calorimetry runs.</p>
      </div>
      <nav aria-label="New sheet" className="grid gap-3 sm:grid-cols-4">
        {SHEET_KINDS.map((k) => (
          <Link key={k} href={`/sheets/new?kind=${k}`} className="btn-primary">
            New {KIND_TEXT[k].toLowerCase()}
          </Link>
        ))}
      </nav>
      {message ? (
        <p role="status" className="text-sm text-verdigris-700">
          {message}
        </p>
      ) : null}
      <div className="panel grid gap-3 sm:grid-cols-5" role="search">
        <label className="sm:col-span-2">
          <span className="field-label">Search</span>
          <input type="search" className="field-input" placeholder="Title, lot, formula or note" value={search} onChange={(e) => setSearch(e.target.value)} />
        </label>
        <label>
          <span className="field-label">Type</span>
          <select className="field-input" value={filterValue('kind')} onChange={(e) => setFilter('kind', e.target.value)}>
            <option value="">All</option>
            {SHEET_KINDS.map((k) => (
              <option key={k} value={k}>
                {KIND_TEXT[k]}
              </option>
            ))}
          </select>
        </label>
        <label>
          <span className="field-label">Status</span>
          <select className="field-input" value={filterValue('status')} onChange={(e) => setFilter('status', e.target.value)}>
            <option value="">All</option>
            {SHEET_STATUSES.map((s) => (
              <option key={s} value={s}>
                {STATUS_TEXT[s]}
              </option>
            ))}
          </select>
        </label>
        <label>
          <span className="field-label">Author</span>
          <select className="field-input" value={filterValue('author')} onChange={(e) => setFilter('author', e.target.value)}>
            <option value="">All</option>
            {ctx.people.map((p) => (
              <option key={p.id} value={p.id}>
                {p.displayName}
              </option>
            ))}
          </select>
        </label>
        <label className="sm:col-span-2">
          <span className="field-label">Lot</span>
          <input className="field-input" value={filterValue('lot')} onChange={(e) => setFilter('lot', e.target.value)} />
        </label>
      </div>
      <div className="panel overflow-x-auto p-0">
        <DataTable table={table} caption="Sheets on this device" className="w-full min-w-[44rem] border-collapse text-left text-sm" headCellClassName="px-3 py-2" cellClassName="px-3 py-1" />
        {records === undefined || !ready ? <p className="p-4 text-sm text-ink-soft">Loading the sheets on this device…</p> : rows.length === 0 ? <p className="p-4 text-sm text-ink-soft">No sheets yet. Start one above.</p> : table.getRowModel().rows.length === 0 ? <p className="p-4 text-sm text-ink-soft">No sheet matches the search and filters.</p> : null}
      </div>
    </div>
  );
}
