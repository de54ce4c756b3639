import { v7 } from 'uuid';

/** Time-ordered UUIDv7: made on servers and devices alike, no reliance on auto-increment. */
export const newId = (): string => v7();
