// An edition as the API, the server's other features and the screens see it. Pure module (the
// schema import is type-only).
import type { EditionState } from '@/db/schema/editions';

/** An edition as the API and other features see it (dates as ISO strings). */
export interface Edition {
  id: string;
  siteId: string;
  number: number;
  state: EditionState;
  baseEditionId: string | null;
  changeSummary: string;
  authorUserId: string;
  approverUserId: string | null;
  rejectedByUserId: string | null;
  rejectionReason: string | null;
  createdAt: string;
  updatedAt: string;
  submittedAt: string | null;
  rejectedAt: string | null;
  inForceAt: string | null;
  retiredAt: string | null;
  revision: number;
  valueCount: number;
  contentHash: string | null;
  /** Strong validator of the edition's body: changes whenever a value or the edition itself changes. */
  etag: string;
}
