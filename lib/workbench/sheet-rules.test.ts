import { describe, expect, it } from 'vitest';
import { mayEdit, mayReturnToDraft, maySignOff, maySubmit } from './sheet-rules';

const tech = { userId: 'u-tech', role: 'technician' as const };
const sup = { userId: 'u-sup', role: 'supervisor' as const };
const sup2 = { userId: 'u-sup2', role: 'supervisor' as const };

describe('sheet rules', () => {
  it('a supervisor other than the author signs off a submitted sheet; the author and technicians cannot', () => {
    const s = { status: 'submitted' as const, authorId: 'u-sup' };
    expect(maySignOff(s, sup2).ok).toBe(true);
    expect(maySignOff(s, sup)).toEqual({ ok: false, reason: 'You wrote this sheet: a supervisor other than its author signs it off.' });
    expect(maySignOff({ ...s, authorId: 'u-x' }, tech).ok).toBe(false);
    expect(maySignOff({ ...s, status: 'draft' }, sup2).ok).toBe(false);
  });

  it('a signed-off sheet is locked for everyone; a draft is edited by its author or corrected by a supervisor', () => {
    expect(mayEdit({ status: 'signed_off', authorId: 'u-tech' }, tech).ok).toBe(false);
    expect(mayEdit({ status: 'signed_off', authorId: 'u-tech' }, sup).ok).toBe(false);
    expect(mayEdit({ status: 'draft', authorId: 'u-tech' }, tech).ok).toBe(true);
    expect(mayEdit({ status: 'draft', authorId: 'u-other' }, tech).ok).toBe(false);
    expect(mayEdit({ status: 'draft', authorId: 'u-other' }, sup).ok).toBe(true);
  });

  it('only a draft that solves is submitted; only a submitted sheet goes back to draft', () => {
    expect(maySubmit({ status: 'draft', authorId: 'u-tech' }, tech, false).ok).toBe(false);
    expect(maySubmit({ status: 'draft', authorId: 'u-tech' }, tech, true).ok).toBe(true);
    expect(mayReturnToDraft({ status: 'submitted', authorId: 'u-tech' }, tech).ok).toBe(true);
    expect(mayReturnToDraft({ status: 'draft', authorId: 'u-tech' }, tech).ok).toBe(false);
  });
});
