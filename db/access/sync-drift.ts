import 'server-only';
import { getEditionInForce, getEditionOrThrow, getEditionValues, type Edition } from '@/db/access/editions';
import type { Sheet } from '@/lib/sheets/sheet-schema';
import { sameJson } from '@/lib/sync/canonical-json';
import { substituteEditionValues } from '@/lib/sync/edition-inputs';
import { safeSolve } from '@/lib/thermo';
import { AppError } from '@/lib/server/errors';

export interface DriftInfo {
  pinnedEditionId: string;
  inForceEditionId: string;
  pinnedResult: unknown;
  inForceResult: unknown;
  /** Inputs the edition in force has no value for. */
  missing: string[];
}

/** The server's own result for a sheet: lib/thermo's solve of the sheet's problem (never the client's). */
export function solveSheet(problem: unknown): { ok: true; value: unknown } | { ok: false; errors: { code: string; field: string; message: string }[] } {
  if (!problem) return { ok: false, errors: [{ code: 'no_problem', field: 'problem', message: 'The sheet has no problem to solve yet' }] };
  try {
    return safeSolve(problem);
  } catch (error) {
    return { ok: false, errors: [{ code: 'engine_error', field: 'problem', message: error instanceof Error ? error.message : 'The engine failed' }] };
  }
}

/** Per-push cache of editions (a batch may carry many sheets pinned to the same edition). */
export class EditionContext {
  private inForce: Promise<Edition | null> | undefined;
  private editions = new Map<string, Promise<Edition | null>>();
  private values = new Map<string, ReturnType<typeof getEditionValues>>();
  constructor(readonly siteId: string) {}

  editionInForce() {
    return (this.inForce ??= getEditionInForce(this.siteId));
  }
  edition(id: string) {
    let p = this.editions.get(id);
    if (!p) {
      p = getEditionOrThrow(this.siteId, id).catch((e: unknown) => {
        if (e instanceof AppError && e.code === 'not_found') return null;
        throw e;
      });
      this.editions.set(id, p);
    }
    return p;
  }
  editionValues(id: string) {
    let p = this.values.get(id);
    if (!p) {
      p = getEditionValues(id);
      this.values.set(id, p);
    }
    return p;
  }
}

/** Re-solve a sheet with the values of another edition for its edition inputs. */
export async function resolveWithEdition(sheet: Sheet, editionId: string, ctx: EditionContext) {
  const values = await ctx.editionValues(editionId);
  const index = new Map(values.map((v) => [`${v.species}|${v.phase}|${v.property}`, v]));
  const sub = substituteEditionValues((sheet.problem ?? {}) as Record<string, unknown>, sheet.inputs, editionId, (species, phase, property) => {
    const v = index.get(`${species}|${phase}|${property}`);
    return v ? { value: v.value, uncertainty: v.uncertainty, source: v.source } : undefined;
  });
  return { ...sub, solved: solveSheet(sub.problem) };
}

/**
 * Edition drift (design.md §2): the sheet is pinned to an edition that was retired before the sheet
 * reached the server, and its numbers differ under the edition in force. Checked when a sheet
 * arrives newly pinned (a new sheet, or a changed pin), so a supervisor's "keep the pinned edition"
 * is not asked again on every later edit.
 */
export async function detectDrift(sheet: Sheet, serverResult: unknown, ctx: EditionContext): Promise<DriftInfo | null> {
  if (!sheet.pinnedEditionId || !sheet.problem || sheet.deleted) return null;
  const inForce = await ctx.editionInForce();
  if (!inForce || inForce.id === sheet.pinnedEditionId) return null;
  const pinned = await ctx.edition(sheet.pinnedEditionId);
  if (!pinned || pinned.state !== 'retired') return null;
  const redo = await resolveWithEdition(sheet, inForce.id, ctx);
  const inForceResult = redo.solved.ok ? redo.solved.value : { errors: redo.solved.errors };
  if (sameJson(inForceResult, serverResult)) return null;
  return { pinnedEditionId: pinned.id, inForceEditionId: inForce.id, pinnedResult: serverResult, inForceResult, missing: redo.missing };
}
