import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen } from '@testing-library/react';
import { renderWithProviders, strictFetch } from '../helpers/render';
import { RequireRole } from '../../src/components/require-role';

afterEach(() => vi.unstubAllGlobals());

describe('RequireRole', () => {
  it('when a viewer opens a curator page, then it explains the role needed instead of the page', async () => {
    vi.stubGlobal(
      'fetch',
      strictFetch({ '/api/auth/me': { user: { id: 1, email: 'v@x.org', name: 'V', role: 'viewer' } } }),
    );
    renderWithProviders(
      <RequireRole least="curator">
        <p>secret curation page</p>
      </RequireRole>,
    );
    expect(await screen.findByRole('alert')).toHaveTextContent(/curator role/);
    expect(screen.queryByText('secret curation page')).not.toBeInTheDocument();
  });

  it('when an admin opens a curator page, then the page shows', async () => {
    vi.stubGlobal(
      'fetch',
      strictFetch({ '/api/auth/me': { user: { id: 2, email: 'a@x.org', name: 'A', role: 'admin' } } }),
    );
    renderWithProviders(
      <RequireRole least="curator">
        <p>secret curation page</p>
      </RequireRole>,
    );
    expect(await screen.findByText('secret curation page')).toBeInTheDocument();
  });
});
