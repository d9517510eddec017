import { describe, expect, it } from 'vitest';
import { screen, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { renderWithProviders } from '../helpers/render';
import { PeopleTable } from '../../src/features/people/components/people-table';
import type { AdminUser } from '../../shared/schemas/accounts';

const people: AdminUser[] = [
  {
    id: 1,
    name: 'Bea Admin',
    email: 'bea@example.org',
    role: 'admin',
    status: 'active',
    lastSignInAt: '2026-11-30T09:15:00.000Z',
    createdAt: '2026-01-01T00:00:00.000Z',
  },
  {
    id: 2,
    name: 'Abel Viewer',
    email: 'abel@example.org',
    role: 'viewer',
    status: 'disabled',
    lastSignInAt: null,
    createdAt: '2026-01-02T00:00:00.000Z',
  },
];

const names = () =>
  screen
    .getAllByRole('row')
    .slice(1)
    .map((r) => within(r).getAllByRole('cell')[0].textContent);

describe('PeopleTable', () => {
  it('lists name, e-mail, role, status and last sign-in, marking the signed-in admin', () => {
    renderWithProviders(<PeopleTable people={people} meId={1} />);
    const bea = screen.getByText('bea@example.org').closest('tr')!;
    expect(bea).toHaveTextContent('(you)');
    expect(within(bea).getByLabelText('Role of Bea Admin')).toHaveValue('admin');
    const abel = screen.getByText('abel@example.org').closest('tr')!;
    expect(abel).toHaveTextContent('disabled');
    expect(abel).toHaveTextContent('never');
    expect(within(abel).getByRole('button', { name: 'Enable Abel Viewer' })).toBeInTheDocument();
  });

  it('sorts by name, and reverses when the header is clicked', async () => {
    renderWithProviders(<PeopleTable people={people} meId={1} />);
    expect(names()).toEqual(['Abel Viewer', 'Bea Admin(you)']);
    await userEvent.click(screen.getByRole('button', { name: /Name/ }));
    expect(names()).toEqual(['Bea Admin(you)', 'Abel Viewer']);
  });
});
