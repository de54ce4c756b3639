// The invented demo scenario (design.md §7): a fictional plant and its role accounts.
export const DEMO_SITE = { code: 'calder-reach', name: 'Calder Reach Works' } as const;
export const DEMO_AREAS = ['Dissolver hall', 'QC lab'] as const;
/** Shown in the README; demo accounts only. */
export const DEMO_PASSWORD = 'calder-reach-demo';
export const DEMO_USERS = [
  { email: 'technician@calder-reach.test', displayName: 'Dissolver hall technician', role: 'technician' },
  { email: 'qc.technician@calder-reach.test', displayName: 'QC lab technician', role: 'technician' },
  { email: 'supervisor@calder-reach.test', displayName: 'Shift supervisor', role: 'supervisor' },
  { email: 'qc.supervisor@calder-reach.test', displayName: 'QC supervisor', role: 'supervisor' },
  { email: 'admin@calder-reach.test', displayName: 'Site admin', role: 'admin' },
] as const;
