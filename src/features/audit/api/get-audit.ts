import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import type { AuditEntry, Page } from '../../../../shared/schemas/workspace-views';
import { api } from '@/config/paths';
import { apiFetch } from '@/lib/api-client';

export type { AuditEntry };
export type AuditFilters = { actor?: string; action?: string; workstationId?: number; page?: number };

export function getAudit(f: AuditFilters) {
  const p = new URLSearchParams({ pageSize: '200' });
  for (const [k, v] of Object.entries(f)) if (v !== undefined && v !== '') p.set(k, String(v));
  return apiFetch<Page<AuditEntry>>(`${api.audit}?${p}`);
}

export const auditKeys = { all: ['audit'] as const, list: (f: AuditFilters) => ['audit', f] as const };

export const auditQueryOptions = (f: AuditFilters) =>
  queryOptions({ queryKey: auditKeys.list(f), queryFn: () => getAudit(f), placeholderData: keepPreviousData });

export const useAudit = (f: AuditFilters) => useQuery(auditQueryOptions(f));
