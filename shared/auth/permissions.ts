export const ROLES = ['admin', 'engineer', 'viewer', 'operator'] as const;
export type Role = (typeof ROLES)[number];

export const PERMISSIONS = [
  'people:manage',
  'outbox:read',
  'audit:read',
  'calculators:use',
  'scenarios:read',
  'scenarios:write',
  'runs:write',
  'scenarios:approve',
  'reports:share',
  'boards:assign',
  'boards:read-own',
] as const;
export type Permission = (typeof PERMISSIONS)[number];

const READER: Permission[] = ['calculators:use', 'scenarios:read', 'reports:share', 'audit:read'];

export const ROLE_PERMISSIONS: Record<Role, readonly Permission[]> = {
  admin: PERMISSIONS,
  engineer: [...READER, 'scenarios:write', 'runs:write', 'scenarios:approve'],
  viewer: READER,
  operator: ['boards:read-own'],
};

export function can(role: Role | undefined | null, permission: Permission): boolean {
  return role != null && ROLE_PERMISSIONS[role].includes(permission);
}

export const ROLE_LABELS: Record<Role, string> = {
  admin: 'Admin',
  engineer: 'Engineer',
  viewer: 'Viewer',
  operator: 'Operator',
};

export const ROLE_HOME: Record<Role, string> = {
  admin: '/people',
  engineer: '/scenarios',
  viewer: '/scenarios',
  operator: '/station',
};
