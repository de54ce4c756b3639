'use client';
// The two workbench screens: a new sheet (`/sheets/new?kind=…`) and the record shell
// (`/sheets/open?id=…`). Both read their parameter on the device, so one stored page serves every
// sheet — including sheets made offline, which have no server-rendered page.
import Link from 'next/link';
import { useSearchParams } from 'next/navigation';
import { BenchStoreGate } from '@/components/bench/bench-site-context';
import { SheetBenchEntries } from '@/components/bench/sheet-bench-entries';
import { useSheet } from '@/lib/local';
import { SHEET_KINDS, type SheetKind } from '@/lib/sheets/sheet-schema';
import { SheetEditor } from './sheet-editor';
import { useWorkbenchStore } from './use-workbench-store';
import type { WorkbenchContext } from './workbench-context';

export function NewSheetScreen({ ctx }: { ctx: WorkbenchContext }) {
  const params = useSearchParams();
  const { ready } = useWorkbenchStore(ctx.identity);
  const asked = params.get('kind') ?? 'cycle';
  const kind: SheetKind | null = (SHEET_KINDS as readonly string[]).includes(asked) ? (asked as SheetKind) : null;
  // The bench log starts a calorimetry sheet for its lot: `/sheets/new?kind=calorimetry&lot=…`.
  const lot = (params.get('lot') ?? '').trim().slice(0, 80);
  if (!kind) {
    return (
      <p role="alert" className="panel">
        “{asked}” is not a kind of sheet. Start a <Link href="/sheets/new?kind=cycle">lattice cycle</Link>, <Link href="/sheets/new?kind=dissolution">dissolution</Link>, <Link href="/sheets/new?kind=reaction">reaction</Link> or{' '}
        <Link href="/sheets/new?kind=calorimetry">calorimetry</Link> sheet.
      </p>
    );
  }
  if (!ready) return <p className="text-sm text-ink-soft">Opening this device’s store…</p>;
  return <SheetEditor key={`${kind}:${lot}`} ctx={ctx} kind={kind} record={null} initialLotRef={lot} />;
}

export function OpenSheetScreen({ ctx }: { ctx: WorkbenchContext }) {
  const params = useSearchParams();
  const id = params.get('id');
  const { ready } = useWorkbenchStore(ctx.identity);
  const record = useSheet(ready ? id : null);
  if (!id) return <p role="alert">No sheet id in the address. Open a sheet from the <Link href="/sheets">list</Link>.</p>;
  if (!ready || record === undefined) return <p className="text-sm text-ink-soft">Opening the sheet from this device…</p>;
  if (record === null || record.content.deleted) {
    return (
      <p role="alert" className="panel">
        This sheet is not on this device{record?.content.deleted ? ' (it was deleted)' : ''}. If it was made on another device, sync and try again. Back to the <Link href="/sheets">sheets</Link>.
      </p>
    );
  }
  return (
    <div className="space-y-6">
      <SheetEditor key={record.content.id} ctx={ctx} kind={record.content.kind} record={record} />
      {/* Notes and photos from the bench, tied to this sheet (the bench log's own component). */}
      <div className="panel print:hidden">
        <BenchStoreGate identity={ctx.identity} areas={ctx.areas} people={ctx.people}>
          <SheetBenchEntries sheetId={record.content.id} lotRef={record.content.lotRef} />
        </BenchStoreGate>
      </div>
    </div>
  );
}
