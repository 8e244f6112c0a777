import { render, screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { createMemoryRouter, Link, RouterProvider } from 'react-router-dom';
import { describe, expect, it } from 'vitest';
import { UnsavedChangesGuard } from './unsaved-changes-guard';

/** A data router (the blocker needs one) with the guarded page and a page to leave for. */
function renderGuarded(guard: React.ReactElement) {
  const router = createMemoryRouter([
    {
      path: '/',
      element: (
        <>
          <h1>Form page</h1>
          {guard}
          <Link to="/elsewhere">Elsewhere</Link>
        </>
      ),
    },
    { path: '/elsewhere', element: <h1>Elsewhere page</h1> },
  ]);
  render(<RouterProvider router={router} />);
  return router;
}

describe('UnsavedChangesGuard', () => {
  it('asks before leaving with edits; Cancel stays, "Leave and lose edits" goes', async () => {
    const user = userEvent.setup();
    const router = renderGuarded(<UnsavedChangesGuard dirty what="the new house" offerAlternative={false} />);
    await user.click(screen.getByRole('link', { name: 'Elsewhere' }));
    const dialog = await screen.findByRole('dialog', { name: 'Leave without saving?' });
    expect(dialog.textContent).toContain('Your edits to the new house are not saved.');
    expect(dialog.textContent).not.toContain('alternative');

    await user.click(screen.getByRole('button', { name: 'Cancel' }));
    await waitFor(() => expect(screen.queryByRole('dialog')).toBeNull());
    expect(router.state.location.pathname).toBe('/');
    expect(screen.getByRole('heading', { name: 'Form page' })).toBeTruthy();

    await user.click(screen.getByRole('link', { name: 'Elsewhere' }));
    await user.click(await screen.findByRole('button', { name: 'Leave and lose edits' }));
    await screen.findByRole('heading', { name: 'Elsewhere page' });
    expect(router.state.location.pathname).toBe('/elsewhere');
  });

  it('on the house page it also offers saving the edits as an alternative', async () => {
    const user = userEvent.setup();
    renderGuarded(<UnsavedChangesGuard dirty />);
    await user.click(screen.getByRole('link', { name: 'Elsewhere' }));
    const dialog = await screen.findByRole('dialog', { name: 'Leave without saving?' });
    expect(dialog.textContent).toContain('Your edits to this house are not saved.');
    expect(dialog.textContent).toContain('(or save them as an alternative)');
  });

  it('lets the page go without asking when nothing is unsaved', async () => {
    const user = userEvent.setup();
    const router = renderGuarded(<UnsavedChangesGuard dirty={false} />);
    await user.click(screen.getByRole('link', { name: 'Elsewhere' }));
    await screen.findByRole('heading', { name: 'Elsewhere page' });
    expect(router.state.location.pathname).toBe('/elsewhere');
    expect(screen.queryByRole('dialog')).toBeNull();
  });

  it('asks the browser before a reload or closing the tab only while there are edits', () => {
    const { unmount } = render(
      <RouterProvider
        router={createMemoryRouter([{ path: '/', element: <UnsavedChangesGuard dirty offerAlternative={false} /> }])}
      />,
    );
    const withEdits = new Event('beforeunload', { cancelable: true });
    window.dispatchEvent(withEdits);
    expect(withEdits.defaultPrevented).toBe(true);
    unmount();
    const afterwards = new Event('beforeunload', { cancelable: true });
    window.dispatchEvent(afterwards);
    expect(afterwards.defaultPrevented).toBe(false);
  });
});
