import { Suspense } from 'react';
import { NewSheetScreen } from '@/components/sheets/new-sheet-screen';
import { loadSheetsContext } from '../sheets-context';

export const metadata = { title: 'New sheet' };

// The kind is read on the device (?kind=…), so the stored copy of this page serves every kind offline.
export default async function NewSheetPage() {
  const ctx = await loadSheetsContext('/sheets/new');
  return (
    <Suspense fallback={<p className="text-sm text-ink-soft">Opening the workbench…</p>}>
      <NewSheetScreen ctx={ctx} />
    </Suspense>
  );
}
