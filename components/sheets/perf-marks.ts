'use client';
// Performance marks for the workbench benchmark (perf/workbench.bench.ts): from the input event to
// React's commit of the updated result and ladder.
import { useLayoutEffect } from 'react';

let pending = false;

/** Call in an input's change handler. */
export function markInput() {
  if (typeof performance === 'undefined') return;
  performance.mark('workbench:input');
  pending = true;
}

/** Mark the commit that shows the result of `value` (call in the component that renders it). */
export function useMarkCommit(value: unknown) {
  useLayoutEffect(() => {
    if (!pending || typeof performance === 'undefined') return;
    pending = false;
    performance.mark('workbench:commit');
    performance.measure('workbench:input-to-commit', 'workbench:input', 'workbench:commit');
  }, [value]);
}
