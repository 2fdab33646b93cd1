import { render, screen, within } from '@testing-library/react';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import type { AuditEntry } from '../../../../shared/schemas/workspace-views';
import { useAudit } from '@/features/audit/api/get-audit';
import { AuditPage } from './audit-page';

vi.mock('@/features/audit/api/get-audit', () => ({ useAudit: vi.fn() }));

const ENTRIES: AuditEntry[] = [
  {
    id: 2,
    actorName: 'Tomas Okafor',
    actorEmail: null,
    action: 'workstation.changed',
    targetType: 'workstation',
    targetId: '4',
    targetName: 'Sanding bench',
    detail: { changes: [{ field: 'worker.z_m', from: 1.5, to: 1.2 }] },
    createdAt: '2026-12-02T14:05:00Z',
  },
  {
    id: 1,
    actorName: 'Ilse Varga',
    actorEmail: 'admin@motewalk.local',
    action: 'person.invited',
    targetType: 'person',
    targetId: '9',
    targetName: 'Noor Hassan',
    detail: { role: 'viewer' },
    createdAt: '2026-12-02T13:00:00Z',
  },
];

function show(items: AuditEntry[]) {
  vi.mocked(useAudit).mockReturnValue({
    data: { items, total: items.length, page: 1, pageSize: 200 },
    isPending: false,
    error: null,
  } as unknown as ReturnType<typeof useAudit>);
  render(<AuditPage workstations={[]} />);
}

beforeEach(() => vi.mocked(useAudit).mockReset());

describe('audit trail page', () => {
  it('tells each entry in words: who, what they did to which named thing, and what changed', () => {
    show(ENTRIES);
    const rows = within(screen.getByRole('table', { name: 'Audit trail' })).getAllByRole('row');
    expect(rows[1].textContent).toContain('Tomas Okafor');
    expect(rows[1].textContent).toContain('changed the workstation “Sanding bench”');
    expect(within(rows[1]).getByRole('list', { name: 'What changed' }).textContent).toBe('worker z from 1.5 m to 1.2 m');
    expect(rows[2].textContent).toContain('invited Noor Hassan as Viewer');
  });

  it('shows an address under the name only where the server sent one', () => {
    show(ENTRIES);
    expect(screen.getAllByText(/@/)).toHaveLength(1);
    expect(screen.getByText('admin@motewalk.local')).toBeTruthy();
  });

  it('offers the actions in words, not their codes', () => {
    show(ENTRIES);
    const action = screen.getByLabelText('Action');
    expect(within(action).getByRole('option', { name: 'Limit overridden' })).toBeTruthy();
    expect(within(action).queryByRole('option', { name: 'agent.limit_overridden' })).toBeNull();
  });
});
