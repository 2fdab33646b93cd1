import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { beforeEach, describe, expect, it, vi } from 'vitest';
import { useSetPassword } from '@/features/auth/api/set-password';
import { SetPasswordForm } from './set-password-form';

vi.mock('@/features/auth/api/set-password', () => ({ useSetPassword: vi.fn() }));

// Long enough for the shared schema (20 to 200 characters).
const TOKEN = 'a'.repeat(32);
const mutate = vi.fn();
beforeEach(() => {
  mutate.mockReset();
  vi.mocked(useSetPassword).mockReturnValue({ mutate, error: null, isPending: false } as unknown as ReturnType<typeof useSetPassword>);
});

async function typeBoth(first: string, second: string) {
  const user = userEvent.setup();
  render(<SetPasswordForm token={TOKEN} onDone={() => {}} />);
  await user.type(screen.getByLabelText('New password'), first);
  await user.type(screen.getByLabelText('Repeat the password'), second);
  await user.click(screen.getByRole('button', { name: 'Set password' }));
}

// Common practice for a new password: typed twice, sent only when both agree; the message sits on the repeat field.
describe('set-password form', () => {
  it('sends nothing and marks the repeat field when the two passwords differ', async () => {
    await typeBoth('correct horse battery', 'correct horse batterY');
    expect(mutate).not.toHaveBeenCalled();
    expect(screen.getByLabelText('Repeat the password').getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByRole('alert').textContent).toBe('The two passwords differ');
  });

  it('sends the token and the password, not the repeat, when both agree', async () => {
    await typeBoth('correct horse battery', 'correct horse battery');
    expect(mutate).toHaveBeenCalledTimes(1);
    expect(mutate.mock.calls[0][0]).toEqual({ token: TOKEN, password: 'correct horse battery' });
  });

  it('sends nothing for a password of twelve spaces or one under 12 characters, and says why', async () => {
    await typeBoth(' '.repeat(12), ' '.repeat(12));
    expect(mutate).not.toHaveBeenCalled();
    expect(screen.getByLabelText('New password').getAttribute('aria-invalid')).toBe('true');
    expect(screen.getByText('Use more than spaces')).toBeTruthy();
  });

  it('shows the minimum length the shared rule sets', () => {
    render(<SetPasswordForm token={TOKEN} onDone={() => {}} />);
    expect(screen.getByText('At least 12 characters.')).toBeTruthy();
  });
});
