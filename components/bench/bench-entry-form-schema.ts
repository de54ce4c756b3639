// The bench entry form's schema: what a person types, checked before the record is built (the
// record itself is checked again with the synced schema, lib/bench/bench-entry-schema.ts).
import { z } from 'zod';
import { parseTags } from './bench-log-groups';

export const benchEntryFormSchema = z.object({
  lotRef: z.string().trim().min(1, { message: 'Give the lot this entry belongs to' }).max(80, { message: 'At most 80 characters' }),
  note: z.string().max(20_000, { message: 'At most 20,000 characters' }),
  areaId: z.string(),
  tags: z
    .string()
    .max(2_000)
    .refine((t) => parseTags(t).every((x) => x.length <= 40), { message: 'Each tag at most 40 characters' })
    .refine((t) => parseTags(t).length <= 30, { message: 'At most 30 tags' }),
  sheetId: z.string(),
});
export type BenchEntryFormValues = z.infer<typeof benchEntryFormSchema>;
