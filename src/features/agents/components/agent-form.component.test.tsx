import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import type { AgentRecord } from '../../../../shared/schemas/workspace-views';
import { ApiError } from '@/lib/api-client';
import { useSaveAgent } from '@/features/agents/api/save-agent';
import { AgentForm } from './agent-form';

vi.mock('@/features/agents/api/save-agent', () => ({ useSaveAgent: vi.fn() }));

// Invented limits: the form's behaviour is under test, not the figures.
const opened: AgentRecord = {
  id: 3,
  name: 'Test quartz',
  version: 1,
  createdAt: '2026-12-01T00:00:00Z',
  updatedAt: '2026-12-01T00:00:00Z',
  data: {
    density_kgPerM3: 2650,
    shapeFactor: 1,
    limitFraction: 'respirable',
    limit8h_mgPerM3: 0.025,
    limit15min_mgPerM3: null,
    jurisdiction: 'Testland',
    limitSource: 'Test booklet',
    limitDate: '2024',
    override: null,
    notes: '',
  },
};
const stored: AgentRecord = {
  ...opened,
  version: 2,
  data: { ...opened.data, override: { limit8h_mgPerM3: 0.0125, reason: 'Site halves it' } },
};

const mutate = vi.fn();
beforeEach(() => {
  mutate.mockReset();
  vi.mocked(useSaveAgent).mockReturnValue({
    mutate,
    reset: vi.fn(),
    error: null,
    isPending: false,
    isSuccess: false,
  } as unknown as ReturnType<typeof useSaveAgent>);
});

async function saveStale() {
  const user = userEvent.setup();
  mutate.mockImplementationOnce((_v, o) => o.onError(new ApiError(409, 'version_conflict', 'stale', [], { current: stored })));
  render(<AgentForm agent={opened} onDone={() => {}} />);
  await user.clear(screen.getByLabelText('Jurisdiction'));
  await user.type(screen.getByLabelText('Jurisdiction'), 'Elsewhere');
  await user.click(screen.getByRole('button', { name: 'Save changes' }));
  return user;
}

describe('agent form after someone else saved the agent', () => {
  it('sends the version it was opened at', async () => {
    await saveStale();
    expect(mutate.mock.calls[0][0]).toMatchObject({ id: 3, version: 1, body: { data: { jurisdiction: 'Elsewhere', override: null } } });
  });

  it('shows the stored override beside what was typed, saying nothing was saved', async () => {
    await saveStale();
    const panel = screen.getByRole('alert', { name: 'Edit conflict' });
    expect(panel.textContent).toMatch(/Nothing of yours was saved/);
    const override = within(panel).getByRole('row', { name: /Override/ });
    expect(override.textContent).toMatch(/Site halves it/);
    expect(within(panel).getByRole('row', { name: /Jurisdiction/ }).textContent).toMatch(/Elsewhere.*Testland/);
  });

  it('saves the typed fields over the stored version only when asked, naming that version', async () => {
    const user = await saveStale();
    await user.click(screen.getByRole('button', { name: 'Save mine over version 2' }));
    expect(mutate).toHaveBeenCalledTimes(2);
    expect(mutate.mock.calls[1][0]).toMatchObject({ id: 3, version: 2, body: { data: { jurisdiction: 'Elsewhere' } } });
  });

  it('loads the stored agent, override included, and then edits from its version', async () => {
    const user = await saveStale();
    await user.click(screen.getByRole('button', { name: 'Discard mine and load the stored one' }));
    expect(screen.queryByRole('alert', { name: 'Edit conflict' })).toBeNull();
    expect((screen.getByLabelText('Jurisdiction') as HTMLInputElement).value).toBe('Testland');
    expect((screen.getByLabelText('Override 8-h limit') as HTMLInputElement).value).toBe('0.0125');
    await user.click(screen.getByRole('button', { name: 'Save changes' }));
    expect(mutate.mock.calls[1][0]).toMatchObject({ version: 2, body: { data: { override: { limit8h_mgPerM3: 0.0125 } } } });
  });
});
