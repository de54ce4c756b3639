// A form's own message (not one field's): what went wrong with the whole submission, announced.
export function FormAlert({ children }: { children: React.ReactNode }) {
  return (
    <p role="alert" className="rounded-md border border-ember-500 bg-ember-50 px-3 py-2 text-sm text-ember-700">
      {children}
    </p>
  );
}
