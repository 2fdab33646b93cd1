import { ROLE_LABELS } from '../../../../shared/auth/permissions';
import type { Person } from '../../../../shared/schemas/auth';
import type { Cell } from '@/lib/csv';

export const PEOPLE_HEADER = ['Name', 'E-mail', 'Role', 'Status', 'Last sign-in (ISO 8601, UTC)'];

export const personRow = (p: Person): Cell[] => [p.name, p.email, ROLE_LABELS[p.role], p.status, p.lastSignInAt];
