'use client';
// The record shell (`/sheets/open?id=…`): the id is read on the device, so one stored page serves
// every sheet — including sheets made offline, which have no server-rendered page. Under the
// calculation it shows the sheet's bench entries.
import Link from 'next/link';
import { useSearchParams } from 'next/navigation';
import { BenchStoreGate } from '@/components/bench/bench-site-context';
import { SheetBenchEntries } from '@/components/bench/sheet-bench-entries';
import { useSheet } from '@/lib/local';
import { SheetEditor } from './sheet-editor';
import { useWorkbenchStore } from './use-workbench-store';
import type { WorkbenchContext } from './workbench-context';

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
