// What the server hands the sheet screens (kept in the stored page, so it is there offline too).
import type { LocalIdentity } from '@/lib/local';
import type { DisplayUnit } from '@/lib/workbench/format-energy';

export interface WorkbenchContext {
  identity: LocalIdentity;
  areas: Array<{ id: string; name: string }>;
  people: Array<{ id: string; displayName: string; role: string }>;
  preferredUnit: DisplayUnit;
}
