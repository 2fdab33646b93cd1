import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLES, ROLE_PERMISSIONS, type Permission, type Role } from '../../shared/auth/permissions';
import { createTestApp, type TestApp } from '../helpers/test-app';
import { routeInventory, type RouteKey } from '../helpers/route-inventory';

type Rule = Permission | 'public' | 'signed-in';

// Every API route with the permission it needs. A route missing here fails the first test.
const RULES: Record<string, Rule> = {
  'GET /api/health': 'public',
  'POST /api/auth/login': 'public',
  'POST /api/auth/set-password': 'public',
  'POST /api/auth/logout': 'signed-in',
  'GET /api/auth/me': 'signed-in',
  'GET /api/people': 'people:manage',
  'POST /api/people': 'people:manage',
  'PATCH /api/people/:id': 'people:manage',
  'POST /api/people/:id/password-link': 'people:manage',
  'GET /api/outbox': 'outbox:read',
  'GET /api/audit': 'audit:read',
  'GET /api/sites': 'scenarios:read',
  'POST /api/sites': 'scenarios:write',
  'PUT /api/sites/:id': 'scenarios:write',
  'DELETE /api/sites/:id': 'scenarios:write',
  'POST /api/rooms': 'scenarios:write',
  'PUT /api/rooms/:id': 'scenarios:write',
  'DELETE /api/rooms/:id': 'scenarios:write',
  'GET /api/workstations/:id': 'scenarios:read',
  'POST /api/workstations': 'scenarios:write',
  'PUT /api/workstations/:id': 'scenarios:write',
  'DELETE /api/workstations/:id': 'scenarios:write',
  'PUT /api/workstations/:id/operators': 'boards:assign',
  'GET /api/agents': 'scenarios:read',
  'GET /api/agents/:id': 'scenarios:read',
  'POST /api/agents': 'scenarios:write',
  'PUT /api/agents/:id': 'scenarios:write',
  'GET /api/scenarios': 'scenarios:read',
  'POST /api/scenarios': 'scenarios:write',
  'GET /api/scenarios/:id': 'scenarios:read',
  'PATCH /api/scenarios/:id': 'scenarios:write',
  'DELETE /api/scenarios/:id': 'scenarios:write',
  'POST /api/scenarios/:id/duplicate': 'scenarios:write',
  'POST /api/scenarios/:id/run-tickets': 'runs:write',
  'POST /api/scenarios/:id/runs': 'runs:write',
  'POST /api/scenarios/:id/approve': 'scenarios:approve',
  'POST /api/scenarios/:id/share': 'reports:share',
  'GET /api/runs/:id': 'scenarios:read',
  'GET /api/boards': 'boards:read-own',
  'GET /api/boards/:workstationId': 'boards:read-own',
  'GET /api/size-profiles': 'scenarios:read',
  'GET /api/size-profiles/:id': 'scenarios:read',
  'GET /api/size-profiles/templates/:format.csv': 'scenarios:read',
  'POST /api/size-profiles': 'scenarios:write',
  'POST /api/size-profiles/upload': 'scenarios:write',
  'DELETE /api/size-profiles/:id': 'scenarios:write',
};

let t: TestApp;
let boardId: number;
beforeAll(async () => {
  t = await createTestApp({ demoWorkspace: true, particles: 300 });
  boardId = (await t.db('workstation_operators').first()).workstation_id;
});
afterAll(() => t.close());

const allowed = (rule: Rule, role: Role | 'anonymous') =>
  rule === 'public' || (role !== 'anonymous' && (rule === 'signed-in' || ROLE_PERMISSIONS[role].includes(rule)));

// Ids that do not exist: an allowed caller then gets 400/404, never a change to the demo data.
const concrete = (key: string) =>
  key.replace(':workstationId', String(boardId)).replace(':format', 'impactor').replace(/:id/g, '999999').split(' ')[1];

describe('access to every API route', () => {
  it('has a permission rule for every route the server defines', () => {
    const routes = routeInventory(t.app);
    expect(routes.length).toBeGreaterThan(30);
    expect(routes.filter((r) => !(r in RULES))).toEqual([]);
    expect(Object.keys(RULES).filter((r) => !routes.includes(r as RouteKey))).toEqual([]);
  });

  for (const role of ['anonymous', ...ROLES] as const) {
    it(`lets ${role} callers through exactly where shared/auth/permissions.ts allows`, async () => {
      const agent = role === 'anonymous' ? t.anonymous() : await t.signIn(role);
      const mismatches: string[] = [];
      for (const [key, rule] of Object.entries(RULES)) {
        if (key === 'POST /api/auth/logout' || key === 'POST /api/auth/login') continue;
        const method = key.split(' ')[0].toLowerCase() as 'get' | 'post' | 'put' | 'patch' | 'delete';
        const res = await agent[method](concrete(key)).send({});
        const refused = res.status === 401 || res.status === 403;
        if (allowed(rule, role) === refused) mismatches.push(`${key} → ${res.status}`);
        if (res.status >= 500) mismatches.push(`${key} → ${res.status} (server error)`);
        if (res.headers['cache-control'] !== 'no-store') mismatches.push(`${key} → Cache-Control ${res.headers['cache-control']}`);
        if (res.headers['content-type']?.includes('json') && res.status >= 400)
          expect(Object.keys(res.body)).toEqual(expect.arrayContaining(['code', 'message']));
      }
      expect(mismatches).toEqual([]);
    });
  }
});
