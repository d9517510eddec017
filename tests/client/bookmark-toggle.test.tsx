import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { renderWithProviders } from '../helpers/render';
import { BookmarkToggle } from '../../src/features/bookmarks/components/bookmark-toggle';

/** A stand-in for the bookmarks API holding one user's list; anything else it is asked fails the test. */
function bookmarkServer() {
  const items: { id: number; recordId: number | null; compoundId: number | null }[] = [];
  const calls: string[] = [];
  const json = (body: unknown, status = 200) =>
    new Response(body === undefined ? null : JSON.stringify(body), {
      status,
      headers: { 'Content-Type': 'application/json' },
    });
  const fetch = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const path = String(input).replace(/^https?:\/\/[^/]+/, '');
    const method = init?.method ?? 'GET';
    calls.push(`${method} ${path}`);
    if (method !== 'GET' && (init?.headers as Record<string, string>)['X-CSRF-Token'] !== 'token-1')
      return json({ error: { code: 'csrf', message: 'no' } }, 403);
    if (method === 'GET' && path === '/api/auth/csrf') return json({ token: 'token-1' });
    if (method === 'GET' && path === '/api/bookmarks') {
      return json({
        items: items.map((item) => ({
          ...item,
          note: null,
          createdAt: '2026-12-01T00:00:00.000Z',
          record: null,
          compound: null,
        })),
      });
    }
    if (method === 'POST' && path === '/api/bookmarks') {
      const body = JSON.parse(String(init?.body));
      const item = { id: items.length + 1, recordId: body.recordId ?? null, compoundId: body.compoundId ?? null };
      items.push(item);
      return json({ ...item, note: null, createdAt: '2026-12-01T00:00:00.000Z', record: null, compound: null }, 201);
    }
    if (method === 'DELETE' && path === '/api/bookmarks?recordId=7') {
      items.splice(
        items.findIndex((item) => item.recordId === 7),
        1,
      );
      return new Response(null, { status: 204 });
    }
    throw new Error(`unexpected request: ${method} ${path}`);
  });
  return { fetch, calls };
}

afterEach(() => vi.unstubAllGlobals());

describe('BookmarkToggle', () => {
  it('when pressed, then it bookmarks the record (with the CSRF token) and shows as pressed; pressed again, it removes it', async () => {
    const server = bookmarkServer();
    vi.stubGlobal('fetch', server.fetch);
    renderWithProviders(<BookmarkToggle recordId={7} label="record 7, benzyl alcohol" />);
    const star = await screen.findByRole('button', { name: 'Bookmark record 7, benzyl alcohol', pressed: false });
    await waitFor(() => expect(star).toBeEnabled());
    await userEvent.click(star);
    await screen.findByRole('button', { name: 'Bookmark record 7, benzyl alcohol', pressed: true });
    expect(server.calls).toContain('POST /api/bookmarks');
    await userEvent.click(screen.getByRole('button', { name: 'Bookmark record 7, benzyl alcohol' }));
    await screen.findByRole('button', { name: 'Bookmark record 7, benzyl alcohol', pressed: false });
    expect(server.calls).toContain('DELETE /api/bookmarks?recordId=7');
  });
});
