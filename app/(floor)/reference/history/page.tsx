import { ValueHistory } from '@/components/reference/value-history';

export const metadata = { title: 'Value history' };

export default async function ValueHistoryPage({ searchParams }: { searchParams: Promise<Record<string, string | string[] | undefined>> }) {
  const p = await searchParams;
  const one = (k: string) => (typeof p[k] === 'string' ? (p[k] as string) : '');
  if (!one('species') || !one('phase') || !one('property')) {
    return <p role="alert">Choose a value from the Reference screen to see its history.</p>;
  }
  return <ValueHistory species={one('species')} phase={one('phase')} property={one('property')} coordination={one('coordination') || undefined} />;
}
