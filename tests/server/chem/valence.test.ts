import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { StructureError } from '../../../server/chem/errors';
import { parseStructure } from '../../../server/chem/parse';
import { createApp } from '../../../server/http/app';
import { agentFor, type Agent } from '../../helpers/agent';
import { postRecord } from '../../helpers/records';
import { rdkit } from './rdkit-reference';

/** Issue 23 point 6: valences no element can have are refused with 422 naming the atom. */
function refusal(text: string): StructureError | null {
  try {
    parseStructure(text);
    return null;
  } catch (error) {
    if (error instanceof StructureError) return error;
    throw error;
  }
}

/** Whether RDKit's MinimalLib (sanitisation checks explicit valence against its periodic table) reads the SMILES. */
async function rdkitAccepts(smiles: string): Promise<boolean> {
  const mol = (await rdkit()).get_mol(smiles);
  mol?.delete();
  return mol !== null && mol !== undefined;
}

// Impossible: a halogen inside a ring or double-bonded to carbon, carbon with five bonds written in the organic subset.
const IMPOSSIBLE = ['C1=NC=CBr=C1', 'C1=CC=CCl=C1', 'C=Br', 'C1CCF1', 'FC(F)(F)(F)F', 'CO(C)C', 'CN(C)(C)C'];
// Ordinary reagents and products, including charged and hypervalent ones written the usual way.
const POSSIBLE = [
  'Brc1ccc(I)cc1',
  'ClCCl',
  'C[N+](=O)[O-]',
  'CS(=O)(=O)C',
  'O=P(OCC)(OCC)OCC',
  'OB(O)c1ccccc1',
  'C[S+](C)C',
  'C[N+](C)(C)C',
  'C1CC[Br+]1',
  'CC(=O)OI(OC(C)=O)c1ccccc1',
];

describe('impossible valences (checked against RDKit MinimalLib, an independent sanitiser)', () => {
  it.each(IMPOSSIBLE)(
    'when %s is given, then 422 valence naming the atom, and RDKit refuses it too',
    async (smiles) => {
      const error = refusal(smiles);
      expect(error?.status, smiles).toBe(422);
      expect(error?.code).toBe('valence');
      expect(error?.message).toMatch(/^Atom \d+ at position \d+ \((Br|Cl|F|C|O|N)\)/);
      expect(error?.details?.atom).toBeGreaterThan(0);
      expect(await rdkitAccepts(smiles)).toBe(false);
    },
  );

  it.each(POSSIBLE)('when %s is given, then it is accepted, as RDKit accepts it', async (smiles) => {
    expect(refusal(smiles)?.message ?? null).toBeNull();
    expect(await rdkitAccepts(smiles)).toBe(true);
  });

  it(
    'when bromine sits in an aromatic ring (one misplaced click in the editor), then the message ' +
      'names the bromine: atom 5 at position 8',
    () => {
      const error = refusal('C1=NC=CBr=C1');
      expect(error?.details).toMatchObject({ atom: 5, position: 8, token: 'Br' });
      expect(error?.message).toMatch(/\(Br\) is double-bonded to carbon/);
    },
  );

  it(
    'when perchloric acid, BrF3 or a λ5-iodane (Dess–Martin periodinane) is given, then it is kept ' +
      '(higher halogen valences to O and F are real)',
    () => {
      for (const smiles of ['OCl(=O)(=O)=O', 'FBr(F)F', 'CC(=O)OI1(OC(C)=O)(OC(C)=O)OC(=O)c2ccccc21'])
        expect(refusal(smiles)?.message ?? null).toBeNull();
    },
  );
});

describe('over HTTP', () => {
  const { app, close } = createApp();
  let member: Agent;
  beforeAll(async () => {
    member = await agentFor(app, 'member');
  });
  afterAll(close);

  it('when a record or a structure preview is sent with C1=NC=CBr=C1, then 422 valence with the atom, and nothing is saved', async () => {
    const preview = await member
      .post('/api/structures/parse')
      .set('X-CSRF-Token', member.csrf)
      .send({ structure: 'C1=NC=CBr=C1' });
    expect(preview.status).toBe(422);
    expect(preview.body.error).toMatchObject({ code: 'valence', details: [{ atom: 5, token: 'Br' }] });
    const before = (await member.get('/api/records?pageSize=1')).body.total;
    const record = await postRecord(member, { structure: 'C1=NC=CBr=C1', notes: 'valence test' });
    expect(record.status).toBe(422);
    expect(record.body.error.message).toMatch(/Br/);
    expect((await member.get('/api/records?pageSize=1')).body.total).toBe(before);
  });
});
