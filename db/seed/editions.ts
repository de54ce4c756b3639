import 'server-only';
import { eq, inArray } from 'drizzle-orm';
import { db } from '@/db/client';
import { contentHash, ensureProperties, insertValues, recordValueEvents } from '@/db/access/edition-values';
import { editions, users } from '@/db/schema';
import { diffEditions } from '@/lib/editions/diff-editions';
import { valueKey } from '@/lib/editions/value-key';
import { newId } from '@/lib/ids';
import type { ReferenceValue } from '@/lib/reference/properties';
import { DEMO_USERS } from './demo-site';
import { STARTER_EDITION_META, STARTER_EDITION_VALUES } from './starter-edition';

// Demo editions for Calder Reach Works: No. 1 (retired, the earlier demo edition) and No. 2 (in
// force, the starter values). Idempotent: a site that has any edition is left exactly as it is.

const ROUNDED_IE = ['Li', 'Na', 'K', 'Rb', 'Cs'];

/**
 * The earlier demo edition: the starter values without the chloride hydrates, and with the first
 * ionization energies of the alkali metals rounded to whole kJ/mol (same NIST source, said in the note).
 */
export function earlierDemoEditionValues(): ReferenceValue[] {
  return STARTER_EDITION_VALUES.filter((v) => !v.species.includes('·')).map((v) => {
    if (v.property !== 'ionization_energy_1' || !ROUNDED_IE.includes(v.species)) return v;
    return { ...v, value: String(Math.round(Number(v.value))), note: `${v.note ?? ''}; rounded to 1 kJ/mol in this earlier demo edition` };
  });
}

export const EARLIER_EDITION_SUMMARY =
  'Earlier demo edition of the Calder Reach Works scenario (seeded, not a real plant record): the starter reference values ' +
  'without the chloride hydrates, and with the first ionization energies of Li, Na, K, Rb and Cs rounded to whole kJ/mol.';
export const STARTER_EDITION_SUMMARY =
  `${STARTER_EDITION_META.title}. ${STARTER_EDITION_META.summary} ` +
  'Compared with No. 1: adds the chloride hydrates and restores the alkali-metal first ionization energies to 0.1 kJ/mol.';

export async function seedEditions(siteId: string): Promise<{ created: boolean }> {
  const [existing] = await db().select({ id: editions.id }).from(editions).where(eq(editions.siteId, siteId)).limit(1);
  await ensureProperties(db());
  if (existing) return { created: false };
  const emails = [DEMO_USERS[0].email, DEMO_USERS[2].email]; // the dissolver hall technician, the shift supervisor
  const people = await db().select().from(users).where(inArray(users.email, emails));
  const technician = people.find((u) => u.email === emails[0]);
  const supervisor = people.find((u) => u.email === emails[1]);
  if (!technician || !supervisor) throw new Error('seed the demo accounts before the editions');

  const first = earlierDemoEditionValues();
  const second = STARTER_EDITION_VALUES;
  const id1 = newId();
  const id2 = newId();
  // Fixed, plausible dates in the scenario's past, so a second seed run is not needed to make them.
  const t = (iso: string) => new Date(iso);
  await db().transaction(async (tx) => {
    await tx.insert(editions).values({
      id: id1, siteId, number: 1, state: 'retired', baseEditionId: null, changeSummary: EARLIER_EDITION_SUMMARY,
      authorUserId: technician.id, approverUserId: supervisor.id,
      createdAt: t('2026-09-01T08:00:00Z'), updatedAt: t('2026-10-05T09:00:00Z'), submittedAt: t('2026-09-02T14:00:00Z'),
      inForceAt: t('2026-09-03T07:30:00Z'), retiredAt: t('2026-10-05T09:00:00Z'),
      valueCount: first.length, contentHash: contentHash(first), inForceSlot: null,
    });
    await insertValues(tx, id1, first);
    await recordValueEvents(tx, siteId, id1, first.map((v) => ({ key: valueKey(v), action: 'added' as const, before: null, after: v })), 'seed', null, t('2026-09-01T08:00:00Z'));
    await tx.insert(editions).values({
      id: id2, siteId, number: 2, state: 'in_force', baseEditionId: id1, changeSummary: STARTER_EDITION_SUMMARY,
      authorUserId: technician.id, approverUserId: supervisor.id,
      createdAt: t('2026-10-01T08:00:00Z'), updatedAt: t('2026-10-05T09:00:00Z'), submittedAt: t('2026-10-02T15:00:00Z'),
      inForceAt: t('2026-10-05T09:00:00Z'), valueCount: second.length, contentHash: contentHash(second), inForceSlot: 1,
    });
    await insertValues(tx, id2, second);
    const d = diffEditions(first, second);
    await recordValueEvents(
      tx, siteId, id2,
      [
        ...d.added.map((x) => ({ key: x.key, action: 'added' as const, before: null, after: x.after })),
        ...d.changed.map((x) => ({ key: x.key, action: 'changed' as const, before: x.before, after: x.after })),
        ...d.removed.map((x) => ({ key: x.key, action: 'removed' as const, before: x.before, after: null })),
      ],
      'seed', null, t('2026-10-01T08:00:00Z'),
    );
  });
  return { created: true };
}
