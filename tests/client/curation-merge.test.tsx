import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { Route, Routes } from 'react-router-dom';
import CurationMergePage from '../../src/routes/curation-merge';
import { renderWithProviders } from '../helpers/render';
import type { MergePreview } from '../../shared/schemas/curation';

const record = (id: number, notebookRef: string, rf: number, stains: string[]): MergePreview['records'][number] => ({
  id,
  status: 'active',
  mergedIntoId: null,
  compound: { id: 3, name: 'benzyl alcohol', synonyms: [], canonicalSmiles: 'OCc1ccccc1' },
  author: { id: id * 10, name: `Author ${id}` },
  technique: 'tlc',
  stationaryPhase: 'silica-gel',
  stationaryPhaseLabel: 'silica gel 40–63 µm',
  eluentNotation: 'EtOAc : hexanes 1 : 4',
  strongSolvent: 'ethyl-acetate',
  strongPercent: 20,
  targetRf: 0.3,
  outcome: 'clean',
  notebookRef,
  revision: 1,
  createdAt: '2026-01-05T10:00:00.000Z',
  updatedAt: '2026-01-05T10:00:00.000Z',
  notes: `notes of ${id}`,
  counts: { spots: 2, photos: 1, visualisations: 2, bookmarks: 1, contributors: 1 },
  spots: [
    { role: 'target', rf, label: null },
    { role: 'starting_material', rf: 0.55, label: 'SM' },
  ],
  stains: stains.map((label) => ({ method: label.toLowerCase(), note: null, label })),
});

const preview: MergePreview = {
  records: [record(5, 'AB-1 p. 4', 0.3, ['KMnO4']), record(9, 'CD-2 p. 7', 0.32, ['KMnO4', 'CAM'])],
  fields: [
    {
      field: 'technique',
      label: 'technique',
      values: [
        { recordId: 5, display: 'TLC' },
        { recordId: 9, display: 'TLC' },
      ],
      differs: false,
    },
    {
      field: 'notebookRef',
      label: 'notebook reference',
      values: [
        { recordId: 5, display: 'AB-1 p. 4' },
        { recordId: 9, display: 'CD-2 p. 7' },
      ],
      differs: true,
    },
  ],
  united: { spots: 4, photos: 2, visualisations: 4, bookmarks: 2, contributors: 2 },
  problems: [],
};

afterEach(() => vi.unstubAllGlobals());

/** Answers the preview and the CSRF token, records the merge request, and fails on anything else. */
function stubServer() {
  const sent: unknown[] = [];
  vi.stubGlobal('fetch', async (input: RequestInfo | URL, init?: RequestInit) => {
    const path = String(input).replace(/^https?:\/\/[^/]+/, '');
    const json = (body: unknown, status = 200) =>
      new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
    if (path === '/api/curation/merge-preview?ids=5,9') return json(preview);
    if (path === '/api/auth/csrf') return json({ token: 't' });
    if (path === '/api/curation/merge' && init?.method === 'POST') {
      sent.push(JSON.parse(String(init.body)));
      const { counts: _counts, notes: _notes, spots: _spots, stains: _stains, ...survivor } = preview.records[0];
      const { counts: _c, notes: _n, spots: _s, stains: _st, ...merged } = preview.records[1];
      return json({ mergeId: 41, survivor, merged: [{ ...merged, status: 'merged', mergedIntoId: 5 }] }, 201);
    }
    throw new Error(`unexpected request: ${init?.method ?? 'GET'} ${path}`);
  });
  return sent;
}

const renderPage = () =>
  renderWithProviders(
    <Routes>
      <Route path="/curation/merge" element={<CurationMergePage />} />
    </Routes>,
    { route: '/curation/merge?ids=5,9' },
  );

describe('the merge screen', () => {
  it(
    'when the curator takes the notebook reference from the second record and confirms, then the ' +
      'merge request names that field and record',
    async () => {
      const sent = stubServer();
      renderPage();
      await userEvent.click(await screen.findByRole('radio', { name: 'notebook reference from record 9' }));
      expect(screen.getByText('(same in all)')).toBeInTheDocument();
      await userEvent.click(screen.getByRole('button', { name: 'Merge into #5' }));
      await screen.findByRole('heading', { name: 'Merge #41 done' });
      expect(sent).toEqual([{ survivorId: 5, mergedIds: [9], fields: { notebookRef: 9 } }]);
    },
  );

  it('when the curator keeps the second record as survivor, then it is the survivor and the first is merged into it', async () => {
    const sent = stubServer();
    renderPage();
    const [, second] = await screen.findAllByRole('radio', { name: 'Keep as survivor' });
    await userEvent.click(second);
    await userEvent.click(await screen.findByRole('button', { name: 'Merge into #9' }));
    await waitFor(() => expect(sent).toEqual([{ survivorId: 9, mergedIds: [5], fields: {} }]));
  });

  it(
    'shows what will be united as values: each spot with its role and Rf, the stains once, then ' +
      'photos, bookmarks and people',
    async () => {
      stubServer();
      renderPage();
      const summary = await screen.findByText(/will also hold/);
      expect(summary.textContent).toMatch(
        /2 plate photos; 2 people keep their bookmarks on it, and 2 people stay credited/,
      );
      // Side by side: each record's spots (role and Rf) and stains, not counts.
      expect(screen.getByText('target Rf 0.32 · starting material Rf 0.55 (SM)')).toBeInTheDocument();
      // United: the survivor's target only (0.32 stays on #9), KMnO4 named once.
      expect(
        screen.getByText('target Rf 0.30 · starting material Rf 0.55 (SM) · starting material Rf 0.55 (SM)'),
      ).toBeInTheDocument();
      expect(screen.getAllByText('KMnO4, CAM')).toHaveLength(2);
      expect(screen.getByText(/stays on its merged record \(2 in all\)/)).toBeInTheDocument();
    },
  );
});
