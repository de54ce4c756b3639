import { ComingArea } from '@/components/ui/coming-area';

export const metadata = { title: 'Bench log' };

export default function BenchPage() {
  return (
    <ComingArea
      title="Bench log"
      purpose="Notes and photos recorded at the bench, tied to a lot and optionally to a sheet, with the lot's calorimetry results beside them."
      status="Capturing entries offline and syncing them arrives with the bench-log release."
    />
  );
}
