import { RungbookMark } from '@/components/ui/rungbook-mark';

export function AuthFrame({ title, children }: { title: string; children: React.ReactNode }) {
  return (
    <main className="mx-auto flex min-h-screen max-w-md flex-col justify-center px-4 py-10">
      <div className="mb-6 flex items-center gap-3">
        <RungbookMark className="h-10 w-10" />
        <span className="text-xl font-semibold tracking-tight">Rungbook</span>
      </div>
      <div className="panel space-y-5 p-6">
        <h1>{title}</h1>
        {children}
      </div>
    </main>
  );
}
