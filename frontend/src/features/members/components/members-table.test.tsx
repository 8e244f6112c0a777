import { QueryClient, QueryClientProvider } from '@tanstack/react-query';
import { render, screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { afterEach, describe, expect, it, vi } from 'vitest';
import { ApiError } from '../../../api/client';
import type { FarmMember } from '../../../api/types';
import { memberErrorMessage } from '../member-errors';
import { MembersTable } from './members-table';

const members: FarmMember[] = [
  { userId: 1, email: 'owner@example.com', name: 'Olive Owner', role: 'owner' },
  { userId: 2, email: 'grower@example.com', name: 'Gus Grower', role: 'grower' },
];

function renderTable(canManage: boolean) {
  const client = new QueryClient({ defaultOptions: { queries: { retry: false }, mutations: { retry: false } } });
  return render(
    <QueryClientProvider client={client}>
      <MembersTable farmId={3} members={members} canManage={canManage} currentUserId={1} />
    </QueryClientProvider>,
  );
}

afterEach(() => vi.unstubAllGlobals());

describe('member errors', () => {
  it('says when the invited address is already a member', () => {
    const message = memberErrorMessage(new ApiError(400, 'That person is already a member of this farm'));
    expect(message).toMatch(/already a member of this farm/);
  });

  it('explains that the last owner cannot be demoted', () => {
    expect(memberErrorMessage(new ApiError(409, 'A farm needs at least one owner'))).toMatch(/at least one owner/);
  });
});

describe('MembersTable', () => {
  it('marks the signed-in user and, for the only owner, offers no demotion and no removal', () => {
    renderTable(true);
    const grid = screen.getByRole('grid', { name: 'Farm members' });
    expect(within(grid).getByText('Olive Owner (you)')).toBeTruthy();
    const removeOwner = screen.getByRole('button', { name: 'Remove owner@example.com' });
    expect((removeOwner as HTMLButtonElement).disabled).toBe(true);
    const removeGrower = screen.getByRole('button', { name: 'Remove grower@example.com' });
    expect((removeGrower as HTMLButtonElement).disabled).toBe(false);
  });

  it('shows the "last owner" error the API gives when a demotion is refused', async () => {
    const user = userEvent.setup();
    vi.stubGlobal(
      'fetch',
      vi.fn(
        async () =>
          new Response(
            JSON.stringify({ statusCode: 409, error: 'Conflict', message: 'A farm needs at least one owner' }),
            {
              status: 409,
              headers: { 'content-type': 'application/json' },
            },
          ),
      ),
    );
    renderTable(true);
    // Grower → owner is allowed client-side; the server refuses (e.g. a race with another owner's change).
    await user.click(screen.getByRole('combobox', { name: 'Role of grower@example.com' }));
    await user.click(await screen.findByRole('option', { name: 'Owner' }));
    expect(await screen.findByText(/make someone else an owner before demoting or removing the last one/)).toBeTruthy();
  });

  it('shows roles as text without controls for a member who may not manage members', () => {
    renderTable(false);
    expect(screen.queryByRole('button', { name: /Remove/ })).toBeNull();
    expect(screen.queryByRole('combobox')).toBeNull();
    expect(screen.getByText('Grower')).toBeTruthy();
  });
});
