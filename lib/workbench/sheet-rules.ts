// Who may do what with a sheet on this screen (the server enforces the same on push: design.md §1).
import type { Sheet } from '@/lib/sheets/sheet-schema';
import { can, type RoleName } from '@/lib/auth/permissions';

export interface Who {
  userId: string;
  role: RoleName;
}

export type Verdict = { ok: true } | { ok: false; reason: string };
const yes: Verdict = { ok: true };
const no = (reason: string): Verdict => ({ ok: false, reason });

/** Edit the content: a draft, by its author (sheet.write) or a supervisor correcting it (sheet.correct). */
export function mayEdit(sheet: Pick<Sheet, 'status' | 'authorId'>, who: Who): Verdict {
  if (sheet.status === 'signed_off') return no('This sheet is signed off and locked. Start a new version to change it.');
  if (sheet.status === 'submitted') return no('This sheet is submitted for sign-off. Return it to draft to change it.');
  if (sheet.authorId !== who.userId && !can(who.role, 'sheet.correct')) return no('Only its author or a supervisor may change this sheet.');
  return yes;
}

export function maySubmit(sheet: Pick<Sheet, 'status' | 'authorId'>, who: Who, solved: boolean): Verdict {
  if (sheet.status !== 'draft') return no('Only a draft can be submitted.');
  if (!solved) return no('The sheet must solve before it is submitted: see the result above.');
  if (sheet.authorId !== who.userId && !can(who.role, 'sheet.correct')) return no('Only its author or a supervisor may submit this sheet.');
  return yes;
}

export function mayReturnToDraft(sheet: Pick<Sheet, 'status' | 'authorId'>, who: Who): Verdict {
  if (sheet.status !== 'submitted') return no('Only a submitted sheet can go back to draft.');
  if (sheet.authorId !== who.userId && !can(who.role, 'sheet.correct')) return no('Only its author or a supervisor may return this sheet.');
  return yes;
}

/** Sign off: a submitted sheet, by a supervisor (sheet.signoff) who is not its author. */
export function maySignOff(sheet: Pick<Sheet, 'status' | 'authorId'>, who: Who): Verdict {
  if (sheet.status !== 'submitted') return no(sheet.status === 'signed_off' ? 'Already signed off.' : 'Submit the sheet first; a draft is not signed off.');
  if (!can(who.role, 'sheet.signoff')) return no('Signing off needs a supervisor.');
  if (sheet.authorId === who.userId) return no('You wrote this sheet: a supervisor other than its author signs it off.');
  return yes;
}

export const STATUS_TEXT: Record<Sheet['status'], string> = { draft: 'Draft', submitted: 'Submitted', signed_off: 'Signed off' };
export const KIND_TEXT: Record<Sheet['kind'], string> = { cycle: 'Lattice cycle', dissolution: 'Dissolution and batch heat', reaction: 'Reaction (Hess)', calorimetry: 'Calorimetry run' };
