import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { Route, Routes } from 'react-router-dom';
import { renderWithProviders, strictFetch } from '../helpers/render';
import AcceptInvitationPage from '../../src/routes/accept-invitation';

afterEach(() => vi.unstubAllGlobals());

const token = 'A'.repeat(43);

function renderPage() {
  vi.stubGlobal(
    'fetch',
    strictFetch({
      [`/api/auth/invitations/${token}`]: {
        email: 'new.person@example.org',
        role: 'member',
        inviterName: 'Ada Admin',
        expiresAt: '2030-01-01T00:00:00.000Z',
      },
    }),
  );
  return renderWithProviders(
    <Routes>
      <Route path="/invitations/:token" element={<AcceptInvitationPage />} />
    </Routes>,
    { route: `/invitations/${token}` },
  );
}

describe('AcceptInvitationPage', () => {
  it('shows who invited which address and with what role', async () => {
    renderPage();
    expect(await screen.findByText(/Ada Admin invited/)).toHaveTextContent('new.person@example.org to join as member');
  });

  it('when the chosen password is a common one, then the shared rule refuses it in the form without sending anything', async () => {
    renderPage();
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText(/Your name/), 'New Person');
    // "qwertyuiop123" is in the NCSC 100k most-used list (SecLists).
    await user.type(screen.getByLabelText(/Choose a password/), 'qwertyuiop123');
    await user.click(screen.getByRole('button', { name: 'Join the group' }));
    expect(await screen.findByText(/most common passwords/)).toBeInTheDocument();
  });

  it('when the password is under 12 characters, then the form says so', async () => {
    renderPage();
    const user = userEvent.setup();
    await user.type(await screen.findByLabelText(/Your name/), 'New Person');
    await user.type(screen.getByLabelText(/Choose a password/), 'tiny-pass');
    await user.click(screen.getByRole('button', { name: 'Join the group' }));
    expect(await screen.findByText('Use at least 12 characters.')).toBeInTheDocument();
  });
});
