import Link from 'next/link';

export const metadata = { title: 'Not allowed' };

export default async function ForbiddenPage({ searchParams }: { searchParams: Promise<{ need?: string }> }) {
  const { need } = await searchParams;
  return (
    <main className="mx-auto max-w-md space-y-4 px-4 py-16">
      <h1>Not allowed for your role</h1>
      <p className="text-ink-soft">
        This screen needs a permission your role does not have{need ? ` (${need})` : ''}. Ask your site admin if you need it.
      </p>
      <Link href="/" className="btn-primary">
        Back to Today
      </Link>
    </main>
  );
}
