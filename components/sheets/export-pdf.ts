'use client';
// Make the PDF record on the device (pdf-lib, loaded only when asked for) and hand it to the browser
// as a download. Works offline: the sheet may not have reached the server yet.
import type { Sheet } from '@/lib/local';
import type { RecordContext } from '@/lib/workbench/sheet-record';

export async function exportSheetPdf(sheet: Sheet, ctx: RecordContext): Promise<void> {
  const [{ renderSheetPdf }, { sheetRecord }, { ladderGeometry }] = await Promise.all([import('@/lib/workbench/sheet-pdf'), import('@/lib/workbench/sheet-record'), import('@/lib/workbench/ladder-geometry')]);
  const r = sheet.result as { kind?: string; result?: unknown } | null;
  const ladder = r?.kind === 'cycle' ? ladderGeometry(r.result as Parameters<typeof ladderGeometry>[0]) : null;
  const bytes = await renderSheetPdf(sheetRecord(sheet, ctx), ladder);
  const url = URL.createObjectURL(new Blob([bytes as BlobPart], { type: 'application/pdf' }));
  const a = document.createElement('a');
  a.href = url;
  a.download = `${sheet.title.replace(/[^\w.-]+/g, '-').replace(/^-+|-+$/g, '') || 'sheet'}-v${sheet.version}.pdf`;
  document.body.append(a);
  a.click();
  a.remove();
  setTimeout(() => URL.revokeObjectURL(url), 10_000);
}
