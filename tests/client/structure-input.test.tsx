import { afterEach, describe, expect, it, vi } from 'vitest';
import { useState } from 'react';
import { fireEvent, screen, waitFor, within } from '@testing-library/react';
import userEvent from '@testing-library/user-event';
import { renderWithProviders } from '../helpers/render';
import { StructureInput, type ParsedStructure } from '../../src/components/structure-input';

vi.mock('../../src/components/structure-input/ocl-editor', () => ({ default: () => <p>drawing editor stand-in</p> }));

afterEach(() => vi.unstubAllGlobals());

type Answer = { status: number; body: unknown };

/** A fetch stand-in for the CSRF token and the parse route only; any other request fails the test. */
function parseServer(answer: (structure: string) => Answer) {
  const sent: string[] = [];
  const fetch = vi.fn(async (input: RequestInfo | URL, init?: RequestInit) => {
    const path = String(input).replace(/^https?:\/\/[^/]+/, '');
    const json = (status: number, body: unknown) =>
      new Response(JSON.stringify(body), { status, headers: { 'Content-Type': 'application/json' } });
    if (path === '/api/auth/csrf') return json(200, { token: 'test-token' });
    if (path === '/api/structures/parse' && init?.method === 'POST') {
      const { structure } = JSON.parse(String(init.body)) as { structure: string };
      sent.push(structure);
      const a = answer(structure);
      return json(a.status, a.body);
    }
    throw new Error(`unexpected request: ${init?.method ?? 'GET'} ${path}`);
  });
  vi.stubGlobal('fetch', fetch);
  return { sent };
}

/** Aspirin as OpenChemLib 9.25 describes it (computed with it while writing this test); the shape is the parse route's. */
const aspirin: ParsedStructure = {
  canonicalSmiles: 'CC(Oc1ccccc1C(O)=O)=O',
  molfile: '',
  formula: 'C9H8O4',
  mw: 180.16,
  exactMass: 180.042,
  clogp: 1.13,
  tpsa: 63.6,
  hbd: 1,
  hba: 4,
  rotatableBonds: 3,
  aromaticRings: 1,
  stereocentres: 0,
  charge: 0,
  classes: ['ester', 'carboxylic-acid'],
  svg: '<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"></svg>',
  name: null,
  isSalt: false,
  isMixture: false,
  existingCompoundId: null,
};

function Harness({
  onChange,
  initial = '',
}: {
  onChange?: (text: string, parsed?: ParsedStructure) => void;
  initial?: string;
}) {
  const [text, setText] = useState(initial);
  return (
    <StructureInput
      value={text}
      defaultMode="paste"
      required
      onChange={(t, p) => {
        setText(t);
        onChange?.(t, p);
      }}
    />
  );
}

describe('StructureInput', () => {
  it('when the server refuses a SMILES, then it shows the server message and marks the place it names', async () => {
    const server = parseServer(() => ({
      status: 400,
      body: {
        error: {
          code: 'smiles_unclosed_ring',
          message: 'Ring bond 1 is opened but never closed.',
          details: [{ path: '', message: 'Ring bond 1 is opened but never closed.', position: 2, token: '1' }],
        },
      },
    }));
    renderWithProviders(<Harness />);
    await userEvent.type(screen.getByLabelText('SMILES or molfile'), 'C1CC');
    const alert = await screen.findByRole('alert', {}, { timeout: 3000 });
    expect(alert).toHaveTextContent('Ring bond 1 is opened but never closed.');
    expect(alert).toHaveTextContent('Where: character 2');
    expect(alert.querySelector('mark')).toHaveTextContent('1');
    expect(server.sent).toEqual(['C1CC']);
    expect(screen.getByLabelText('SMILES or molfile')).toHaveAttribute('aria-invalid', 'true');
  });

  it(
    'when the server refuses an impossible valence (bromine in a ring, one misplaced click), then ' +
      'the preview names the atom and its element before saving',
    async () => {
      const message =
        'Atom 5 at position 8 (Br) is double-bonded to carbon; a halogen binds carbon by one single bond.';
      parseServer(() => ({
        status: 422,
        body: {
          error: { code: 'valence', message, details: [{ path: '', message, atom: 5, position: 8, token: 'Br' }] },
        },
      }));
      renderWithProviders(<Harness />);
      fireEvent.change(screen.getByLabelText('SMILES or molfile'), { target: { value: 'C1=NC=CBr=C1' } });
      const alert = await screen.findByRole('alert', {}, { timeout: 3000 });
      expect(alert).toHaveTextContent(message);
      expect(alert).toHaveTextContent('Where: character 8, atom 5 (Br).');
      expect(alert.querySelector('mark')).toHaveTextContent('B');
      expect(
        within(screen.getByRole('complementary', { name: 'Structure check' })).getByRole('status'),
      ).toHaveTextContent('Not accepted');
    },
  );

  it('when the server accepts, then it shows the formula, weight and classes and hands the parse to the form', async () => {
    const server = parseServer(() => ({ status: 200, body: aspirin }));
    const onChange = vi.fn();
    renderWithProviders(<Harness onChange={onChange} />);
    fireEvent.change(screen.getByLabelText('SMILES or molfile'), { target: { value: '  CC(=O)Oc1ccccc1C(=O)O \n' } });
    expect(await screen.findByLabelText('C9H8O4', {}, { timeout: 3000 })).toBeInTheDocument();
    expect(screen.getByText('180.16')).toBeInTheDocument();
    expect(screen.getByRole('list', { name: 'Compound classes' })).toHaveTextContent(/Ester.*Carboxylic acid/);
    expect(
      within(screen.getByRole('complementary', { name: 'Structure check' })).getByRole('status'),
    ).toHaveTextContent('Accepted');
    expect(server.sent).toEqual(['CC(=O)Oc1ccccc1C(=O)O']);
    await waitFor(() => expect(onChange).toHaveBeenLastCalledWith('  CC(=O)Oc1ccccc1C(=O)O \n', aspirin));
  });

  it('when a two-record SDF is dropped, then its first record is used, data items included, and the user is told', async () => {
    const server = parseServer(() => ({ status: 200, body: { ...aspirin, formula: 'C2H6O' } }));
    renderWithProviders(<Harness />);
    const ethanol = [
      'ethanol',
      '  hand-written',
      '',
      '  3  2  0  0  0  0  0  0  0  0999 V2000',
      '    0.0000    0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0',
      '    1.2990    0.7500    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0',
      '    2.5981    0.0000    0.0000 O   0  0  0  0  0  0  0  0  0  0  0  0',
      '  1  2  1  0  0  0  0',
      '  2  3  1  0  0  0  0',
      'M  END',
    ].join('\n');
    const sdf = `${ethanol}\n> <NAME>\nethanol\n\n$$$$\nmethanol\n\n\n  1  0  0  0  0  0  0  0  0  0999 V2000\nM  END\n$$$$\n`;
    const file = new File([sdf], 'two.sdf', { type: 'chemical/x-mdl-sdfile' });
    fireEvent.drop(screen.getByRole('group', { name: /Structure/ }).querySelector('.mt-1')!, {
      dataTransfer: { files: [file], getData: () => '' },
    });
    const first = `${ethanol}\n> <NAME>\nethanol\n\n`;
    await waitFor(() => expect(screen.getByLabelText('SMILES or molfile')).toHaveValue(first));
    expect(screen.getByText('First record of two.sdf used; the file holds more')).toBeInTheDocument();
    await waitFor(() => expect(server.sent).toEqual([first]), { timeout: 3000 });
  });

  it('moves between Paste and Draw with the arrow keys, loading the editor only when Draw is opened', async () => {
    parseServer(() => ({ status: 200, body: aspirin }));
    renderWithProviders(<Harness />);
    expect(screen.queryByText('drawing editor stand-in')).not.toBeInTheDocument();
    const paste = screen.getByRole('tab', { name: 'Paste or file' });
    expect(paste).toHaveAttribute('aria-selected', 'true');
    paste.focus();
    await userEvent.keyboard('{ArrowLeft}');
    const draw = screen.getByRole('tab', { name: 'Draw' });
    expect(draw).toHaveFocus();
    expect(draw).toHaveAttribute('aria-selected', 'true');
    expect(await screen.findByText('drawing editor stand-in')).toBeInTheDocument();
  });

  it('clears the structure with one action', async () => {
    parseServer(() => ({ status: 200, body: aspirin }));
    renderWithProviders(<Harness initial="CCO" />);
    await userEvent.click(screen.getByRole('button', { name: 'Clear' }));
    expect(screen.getByLabelText('SMILES or molfile')).toHaveValue('');
    expect(screen.getByRole('button', { name: 'Clear' })).toBeDisabled();
  });
});
