// Display helpers shared by the reference and edition screens. Pure module.
import type { Edition } from '@/lib/editions/edition';
export { getJson } from '@/components/ui/post-json';
import { PROPERTIES, type PropertyCode, type ReferenceValue } from '@/lib/reference/properties';

/** An edition as the API sends it (see lib/editions/edition.ts). */
export type EditionInfo = Edition;
export type EditionState = Edition['state'];

export const STATE_LABEL: Record<EditionState, string> = {
  draft: 'Draft',
  in_review: 'In review',
  in_force: 'In force',
  retired: 'Retired',
  discarded: 'Discarded',
};

export function propertyLabel(code: string): string {
  return PROPERTIES[code as PropertyCode]?.label ?? code;
}

/** "Ca2+ (g)", "CaCl2·6H2O (cr)". */
export function speciesLabel(v: Pick<ReferenceValue, 'species' | 'phase'>): string {
  return `${v.species} (${v.phase})`;
}

/** Qualifiers that belong with a value: coordination, structure, hydration scale. */
export function qualifiers(v: ReferenceValue): string {
  return [v.coordination != null ? `CN ${v.coordination}` : '', v.structure ?? '', v.scale ? `${v.scale} scale` : ''].filter(Boolean).join(' · ');
}

export function formatDate(iso: string | null): string {
  if (!iso) return '—';
  return new Date(iso).toISOString().slice(0, 16).replace('T', ' ') + ' UTC';
}

export function historyHref(v: Pick<ReferenceValue, 'species' | 'phase' | 'property' | 'coordination'>): string {
  const q = new URLSearchParams({ species: v.species, phase: v.phase, property: v.property });
  if (v.coordination != null) q.set('coordination', String(v.coordination));
  return `/reference/history?${q.toString()}`;
}

/** GET JSON from our API; throws the server's own message on failure. */
