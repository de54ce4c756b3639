'use client';

/** Loads the address again: the page the user wanted, once the connection is back. */
export function TryAgainButton() {
  return (
    <button type="button" className="btn-primary" onClick={() => window.location.reload()}>
      Try again
    </button>
  );
}
