import { SignedInShell } from '@/components/ui/signed-in-shell';

export const dynamic = 'force-dynamic';

export default function FloorLayout({ children }: { children: React.ReactNode }) {
  return <SignedInShell>{children}</SignedInShell>;
}
