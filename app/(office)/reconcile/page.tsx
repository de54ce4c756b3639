import { ReconcileScreen } from '@/components/reconcile/reconcile-screen';
import { requirePageUser } from '@/lib/auth/current';

export const metadata = { title: 'Reconcile' };

export default async function ReconcilePage() {
  await requirePageUser('reconcile.resolve', '/reconcile');
  return <ReconcileScreen />;
}
