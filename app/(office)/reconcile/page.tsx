import { ComingArea } from '@/components/ui/coming-area';
import { requirePageUser } from '@/lib/auth/current';

export const metadata = { title: 'Reconcile' };

export default async function ReconcilePage() {
  await requirePageUser('reconcile.resolve', '/reconcile');
  return (
    <ComingArea
      title="Reconcile"
      purpose="The supervisors' queue of conflicts between edits and of edition drift, each kept whole until settled."
      status="The queue fills once devices sync sheets and bench entries."
    />
  );
}
