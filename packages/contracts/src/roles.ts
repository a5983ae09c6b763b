// The four roles of the API contract. The order is the order shown in forms.
export const ROLES = ['admin', 'systems_engineer', 'controls_engineer', 'auditor'] as const;
export type Role = (typeof ROLES)[number];

export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Administrator',
  systems_engineer: 'Systems engineer',
  controls_engineer: 'Controls engineer',
  auditor: 'Quality auditor',
};
