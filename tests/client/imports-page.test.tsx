import { afterEach, describe, expect, it, vi } from 'vitest';
import { screen, waitFor } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import ImportsPage from '../../src/routes/imports';
import type { ImportPreview } from '../../shared/schemas/import';
import { renderWithProviders } from '../helpers/render';

const headers = ['Compound', 'SMILES', 'Solvent system', 'Rf', 'Remarks'];

/** A dry-run answer for the mapping sent (invented rows; the contract is shared/schemas/import.ts). */
function previewFor(mapping: Record<string, string>): ImportPreview {
  const values = {
    Compound: 'benzyl alcohol',
    SMILES: 'OCc1ccccc1',
    'Solvent system': 'EtOAc/hexanes 1:4',
    Rf: '0,28',
    Remarks: 'fine',
  };
  return {
    dryRun: true,
    fileName: 'history.csv',
    sha256: 'a'.repeat(64),
    format: 'csv',
    delimiter: ';',
    headers,
    mapping,
    total: 2,
    blankRows: 1,
    accepted: 1,
    rejected: 1,
    duplicates: 0,
    checked: 2,
    warned: 0,
    sheet: null,
    sheets: [],
    headerRow: 1,
    titleRows: [],
    dates: { column: null, order: null, needsChoice: false, evidence: { dmy: 0, mdy: 0, ambiguous: 0 } },
    rows: [
      {
        row: 1,
        line: 2,
        result: 'accepted',
        reason: null,
        notes: ['No outcome given: recorded as clean.'],
        warnings: [],
        values,
        record: {
          name: 'benzyl alcohol',
          smiles: 'OCc1ccccc1',
          eluent: 'EtOAc : hexanes 1 : 4 (20% EtOAc)',
          rf: 0.28,
          phase: 'silica gel 40–63 µm',
        },
      },
      {
        row: 2,
        line: 3,
        result: 'rejected',
        reason: 'Rf (column "Rf") 1.4 is outside (0, 1].',
        notes: [],
        warnings: [],
        values: { ...values, Compound: 'indole', Rf: '1,4' },
        record: null,
      },
    ],
  };
}

afterEach(() => vi.unstubAllGlobals());

/** Answers the CSRF token, the list of imports and dry runs (recording the mapping each one sent); fails on anything else. */
function stubServer() {
  const mappingsSent: (Record<string, string> | null)[] = [];
  vi.stubGlobal('fetch', async (input: RequestInfo | URL, init?: RequestInit) => {
    const path = String(input).replace(/^https?:\/\/[^/]+/, '');
    const json = (body: unknown) =>
      new Response(JSON.stringify(body), { status: 200, headers: { 'Content-Type': 'application/json' } });
    if (path === '/api/auth/csrf') return json({ token: 't' });
    if (path === '/api/imports' && (init?.method ?? 'GET') === 'GET') return json({ items: [] });
    if (path === '/api/imports?dryRun=1&previewRows=20' && init?.method === 'POST') {
      const form = init.body as FormData;
      const sent = form.get('mapping');
      mappingsSent.push(sent ? JSON.parse(String(sent)) : null);
      const detected = {
        Compound: 'name',
        SMILES: 'structure',
        'Solvent system': 'eluent',
        Rf: 'rf',
        Remarks: 'ignore',
      };
      return json(previewFor(sent ? JSON.parse(String(sent)) : detected));
    }
    throw new Error(`unexpected request: ${init?.method ?? 'GET'} ${path}`);
  });
  return mappingsSent;
}

describe('the import page', () => {
  it('when a file is chosen, then it shows the detected columns, the first rows with their results, and the reasons', async () => {
    stubServer();
    renderWithProviders(<ImportsPage />);
    await userEvent.upload(
      screen.getByLabelText('Choose a file'),
      new File(['x'], 'history.csv', { type: 'text/csv' }),
    );
    expect(await screen.findByTestId('preview-counts')).toHaveTextContent(
      '1 would be added · 1 rejected · 0 duplicates',
    );
    expect(screen.getByLabelText('Field for column "Solvent system"')).toHaveValue('eluent');
    expect(screen.getByText('Rf (column "Rf") 1.4 is outside (0, 1].')).toBeInTheDocument();
    expect(screen.getByText('indole')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Import 1 of 2 rows (1 rejected)' })).toBeEnabled();
  });

  it(
    'when a column is given a field another column holds, then the other column is released and the ' +
      'preview is asked again with that mapping',
    async () => {
      const sent = stubServer();
      renderWithProviders(<ImportsPage />);
      await userEvent.upload(
        screen.getByLabelText('Choose a file'),
        new File(['x'], 'history.csv', { type: 'text/csv' }),
      );
      await screen.findByTestId('preview-counts');
      await userEvent.selectOptions(screen.getByLabelText('Field for column "Remarks"'), 'rf');
      await waitFor(() => expect(sent).toHaveLength(2));
      expect(sent[0]).toBeNull();
      expect(sent[1]).toEqual({
        Compound: 'name',
        SMILES: 'structure',
        'Solvent system': 'eluent',
        Rf: 'ignore',
        Remarks: 'rf',
      });
      await waitFor(() => expect(screen.getByLabelText('Field for column "Rf"')).toHaveValue('ignore'));
    },
  );
});
