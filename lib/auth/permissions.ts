// Roles are cumulative (design.md §1): a supervisor can do all a technician can, an admin all a
// supervisor can. Pure module, shared by pages, route handlers and the client's menus.
export const ROLE_RANK = { technician: 1, supervisor: 2, admin: 3 } as const;
export type RoleName = keyof typeof ROLE_RANK;

export const PERMISSIONS = {
  'site.read': 'technician',
  'sheet.write': 'technician',
  'sheet.correct': 'supervisor',
  'sheet.signoff': 'supervisor',
  'edition.draft': 'technician',
  'edition.approve': 'supervisor',
  'reconcile.resolve': 'supervisor',
  'site.manage': 'admin',
} as const satisfies Record<string, RoleName>;

export type Permission = keyof typeof PERMISSIONS;

export function can(role: RoleName, permission: Permission): boolean {
  return ROLE_RANK[role] >= ROLE_RANK[PERMISSIONS[permission]];
}
