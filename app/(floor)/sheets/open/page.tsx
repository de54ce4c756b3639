import { Suspense } from 'react';
import { OpenSheetScreen } from '@/components/sheets/open-sheet-screen';
import { loadSheetsContext } from '../sheets-context';

export const metadata = { title: 'Sheet' };

// The record shell: the id is read on the device (?id=…) and the sheet from the local store, so a
// sheet made offline opens offline from the one stored copy of this page.
export default async function OpenSheetPage() {
  const ctx = await loadSheetsContext('/sheets/open');
  return (
    <Suspense fallback={<p className="text-sm text-ink-soft">Opening the sheet…</p>}>
      <OpenSheetScreen ctx={ctx} />
    </Suspense>
  );
}
