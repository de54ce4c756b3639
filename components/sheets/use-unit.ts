'use client';
// The user's energy unit (kJ/mol, kcal/mol or eV): kept on the device per user so it works offline,
// starting from the account's preference, and saved to the account when online.
import { useCallback, useSyncExternalStore } from 'react';
import { isDisplayUnit, type DisplayUnit } from '@/lib/workbench/format-energy';

const key = (userId: string) => `rungbook.unit.${userId}`;
const listeners = new Set<() => void>();
const subscribe = (l: () => void) => {
  listeners.add(l);
  return () => listeners.delete(l);
};

export function useUnit(userId: string, accountUnit: DisplayUnit): [DisplayUnit, (u: DisplayUnit) => void] {
  const unit = useSyncExternalStore(
    subscribe,
    () => {
      const v = globalThis.localStorage?.getItem(key(userId));
      return isDisplayUnit(v) ? v : accountUnit;
    },
    () => accountUnit,
  );
  const set = useCallback(
    (u: DisplayUnit) => {
      try {
        localStorage.setItem(key(userId), u);
      } catch {
        /* private mode: the choice lasts for this page only */
      }
      for (const l of listeners) l();
      if (navigator.onLine) {
        void fetch('/api/v1/me/preferences', { method: 'PATCH', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ preferredUnit: u }), credentials: 'same-origin' }).catch(() => undefined);
      }
    },
    [userId],
  );
  return [unit, set];
}
