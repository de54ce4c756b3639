import { ComingArea } from '@/components/ui/coming-area';

export const metadata = { title: 'Sheets' };

export default function SheetsPage() {
  return (
    <ComingArea
      title="Sheets"
      purpose="Saved calculations: lattice cycles, dissolution and batch-heat estimates, reaction (Hess) sheets and calorimetry runs, each pinned to the reference edition it was solved with."
      status="The calculation engine is available to connected systems through POST /api/v1/solve; the workbench screens follow."
    />
  );
}
