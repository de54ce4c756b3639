'use client';
// A new sheet (`/sheets/new?kind=…`). The kind is read on the device, so one stored page serves every
// kind offline. The record shell (`/sheets/open?id=…`) is its own module, open-sheet-screen.tsx, so
// this route does not load the bench log it shows under a saved sheet.
import Link from 'next/link';
import { useSearchParams } from 'next/navigation';
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
