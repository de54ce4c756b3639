// The bench entry form's schema: what a person types, checked before the record is built (the
// record itself is checked again with the synced schema, lib/bench/bench-entry-schema.ts).
import * as z from '@/lib/validation/zod-mini';
import { parseTags } from './bench-log-groups';

export const benchEntryFormSchema = z.object({
  lotRef: z.string().check(z.trim(), z.minLength(1, { message: 'Give the lot this entry belongs to' }), z.maxLength(80, { message: 'At most 80 characters' })),
  note: z.string().check(z.maxLength(20_000, { message: 'At most 20,000 characters' })),
  areaId: z.string(),
  tags: z.string().check(
    z.maxLength(2_000),
    z.refine((t) => parseTags(t).every((x) => x.length <= 40), { message: 'Each tag at most 40 characters' }),
    z.refine((t) => parseTags(t).length <= 30, { message: 'At most 30 tags' }),
  ),
  sheetId: z.string(),
});
export type BenchEntryFormValues = z.infer<typeof benchEntryFormSchema>;
