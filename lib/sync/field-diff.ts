// Field-level differences and field-by-field merges for the reconcile screen. Pure.
import { sameJson } from './canonical-json';

export interface FieldDifference {
  field: string;
  server: unknown;
  /** One value per device version, in the order given. */
  versions: unknown[];
}

/** Fields whose value differs between the server's version and at least one device version. */
export function diffFields(server: Record<string, unknown>, versions: Record<string, unknown>[], fields: readonly string[]): FieldDifference[] {
  return fields
    .filter((f) => versions.some((v) => !sameJson(v[f], server[f])))
    .map((f) => ({ field: f, server: server[f], versions: versions.map((v) => v[f]) }));
}

/**
 * Build a merged record: start from the server's version and take each named field from the chosen
 * source ('server' or a version id). Unknown sources or fields are an error naming them.
 */
export function mergeFieldByField(
  server: Record<string, unknown>,
  versions: Record<string, Record<string, unknown>>,
  choice: Record<string, string>,
  mergeable: readonly string[],
): { ok: true; merged: Record<string, unknown> } | { ok: false; field: string; message: string } {
  const merged: Record<string, unknown> = { ...server };
  for (const [field, source] of Object.entries(choice)) {
    if (!mergeable.includes(field)) return { ok: false, field: `fields.${field}`, message: `Not a field that can be merged (choose from ${mergeable.join(', ')})` };
    if (source === 'server') continue;
    const v = versions[source];
    if (!v) return { ok: false, field: `fields.${field}`, message: `No device version ${source} in this conflict` };
    merged[field] = v[field];
  }
  return { ok: true, merged };
}
