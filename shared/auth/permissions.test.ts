import { describe, expect, it } from 'vitest';
import { PERMISSIONS, ROLES, ROLE_PERMISSIONS, can } from './permissions';

describe('role permissions', () => {
  it('gives admins every permission', () => {
    for (const p of PERMISSIONS) expect(can('admin', p)).toBe(true);
  });

  it('lets viewers read and share but never write, approve or manage people', () => {
    expect(can('viewer', 'scenarios:read')).toBe(true);
    expect(can('viewer', 'reports:share')).toBe(true);
    for (const p of ['scenarios:write', 'runs:write', 'scenarios:approve', 'people:manage', 'outbox:read'] as const)
      expect(can('viewer', p)).toBe(false);
  });

  it('gives engineers everything a viewer has, plus writing and approving', () => {
    for (const p of ROLE_PERMISSIONS.viewer) expect(can('engineer', p)).toBe(true);
    expect(can('engineer', 'scenarios:approve')).toBe(true);
    expect(can('engineer', 'people:manage')).toBe(false);
  });

  it('limits operators to their own station boards', () => {
    expect(ROLE_PERMISSIONS.operator).toEqual(['boards:read-own']);
  });

  it('refuses everything to nobody', () => {
    for (const p of PERMISSIONS) expect(can(undefined, p)).toBe(false);
    expect(ROLES).toHaveLength(4);
  });
});
