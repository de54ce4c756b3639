import { SheetsList } from '@/components/sheets/sheets-list';
import { loadSheetsContext } from './sheets-context';

export const metadata = { title: 'Sheets' };

export default async function SheetsPage() {
  return <SheetsList ctx={await loadSheetsContext('/sheets')} />;
}
