import { describe, expect, it } from 'vitest';
import { can, PERMISSIONS, ROLE_RANK, type RoleName } from './permissions';

const roles = Object.keys(ROLE_RANK) as RoleName[];

describe('role permissions', () => {
  it('a technician cannot approve editions, sign off, resolve or manage the site', () => {
    expect(can('technician', 'sheet.write')).toBe(true);
    expect(can('technician', 'edition.draft')).toBe(true);
    for (const p of ['edition.approve', 'sheet.signoff', 'reconcile.resolve', 'site.manage', 'sheet.correct'] as const) {
      expect(can('technician', p)).toBe(false);
    }
  });
  it('a supervisor can approve and resolve but not manage users', () => {
    expect(can('supervisor', 'edition.approve')).toBe(true);
    expect(can('supervisor', 'reconcile.resolve')).toBe(true);
    expect(can('supervisor', 'site.manage')).toBe(false);
  });
  it('roles are cumulative: whatever a lower role can, every higher role can', () => {
    for (const p of Object.keys(PERMISSIONS) as (keyof typeof PERMISSIONS)[]) {
      for (const lower of roles) for (const higher of roles) {
        if (ROLE_RANK[higher] >= ROLE_RANK[lower] && can(lower, p)) expect(can(higher, p)).toBe(true);
      }
    }
  });
});
