import { render, screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { useState } from 'react';
import { createMemoryRouter, Link, RouterProvider } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { UnsavedChangesGuard } from './unsaved-changes-guard';

function Editor() {
  const [saved, setSaved] = useState('Flanged hood');
  const [name, setName] = useState(saved);
  return (
    <>
      <UnsavedChangesGuard dirty={name !== saved} />
      <label>
        Scenario name
        <input value={name} onChange={(e) => setName(e.target.value)} />
      </label>
      <button type="button" onClick={() => setSaved(name)}>
        Save changes
      </button>
      <Link to="/places">Workstations</Link>
      <Link to="/scenarios/1?tab=runs">Same page, other tab</Link>
    </>
  );
}

function renderAt() {
  const router = createMemoryRouter(
    [
      { path: '/scenarios/1', element: <Editor /> },
      { path: '/places', element: <h1>Sites and workstations</h1> },
    ],
    { initialEntries: ['/scenarios/1'] },
  );
  render(<RouterProvider router={router} />);
  return { router, user: userEvent.setup() };
}

const beforeUnloadCancelled = () => {
  const e = new Event('beforeunload', { cancelable: true });
  window.dispatchEvent(e);
  return e.defaultPrevented;
};

describe('unsaved changes in the scenario editor', () => {
  it('lets a clean editor go without asking', async () => {
    const { router, user } = renderAt();
    expect(beforeUnloadCancelled()).toBe(false);
    await user.click(screen.getByRole('link', { name: 'Workstations' }));
    expect(router.state.location.pathname).toBe('/places');
  });

  it('holds a move to another page while there are edits, and stays on Stay with the edits kept', async () => {
    const { router, user } = renderAt();
    await user.type(screen.getByLabelText('Scenario name'), ', closer');
    await user.click(screen.getByRole('link', { name: 'Workstations' }));
    const dialog = screen.getByRole('alertdialog', { name: 'Leave without saving?' });
    expect(document.activeElement).toBe(dialog);
    expect(router.state.location.pathname).toBe('/scenarios/1');
    await user.click(screen.getByRole('button', { name: 'Stay and keep editing' }));
    expect(screen.queryByRole('alertdialog')).toBeNull();
    expect((screen.getByLabelText('Scenario name') as HTMLInputElement).value).toBe('Flanged hood, closer');
  });

  it('leaves on "Leave without saving"', async () => {
    const { router, user } = renderAt();
    await user.type(screen.getByLabelText('Scenario name'), ' 2');
    await user.click(screen.getByRole('link', { name: 'Workstations' }));
    await user.click(screen.getByRole('button', { name: 'Leave without saving' }));
    expect(router.state.location.pathname).toBe('/places');
  });

  it('asks the browser to warn on tab close only while there are edits', async () => {
    const { user } = renderAt();
    await user.type(screen.getByLabelText('Scenario name'), ' 2');
    expect(beforeUnloadCancelled()).toBe(true);
    await user.click(screen.getByRole('button', { name: 'Save changes' }));
    expect(beforeUnloadCancelled()).toBe(false);
  });

  it('does not ask for a change of query string on the same page', async () => {
    const { router, user } = renderAt();
    await user.type(screen.getByLabelText('Scenario name'), ' 2');
    await user.click(screen.getByRole('link', { name: 'Same page, other tab' }));
    expect(screen.queryByRole('alertdialog')).toBeNull();
    expect(router.state.location.search).toBe('?tab=runs');
  });
});
