import { QueryProvider } from '@/components/providers';

// The reference pages read the edition from the API when online (react-query), unlike the other floor screens.
export default function ReferenceLayout({ children }: { children: React.ReactNode }) {
  return <QueryProvider>{children}</QueryProvider>;
}
