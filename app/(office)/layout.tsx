import { QueryProvider } from '@/components/providers';
import { SignedInShell } from '@/components/ui/signed-in-shell';

export const dynamic = 'force-dynamic';

export default function OfficeLayout({ children }: { children: React.ReactNode }) {
  return (
    <SignedInShell>
      <QueryProvider>{children}</QueryProvider>
    </SignedInShell>
  );
}
