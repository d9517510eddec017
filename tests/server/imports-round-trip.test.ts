import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/http/app';
import { toCsv, toSdf } from '../../server/features/search/export-format';
import { loadListRecords } from '../../server/core/record-queries';
import { agentFor, type Agent } from '../helpers/agent';
import { importFile, runTag } from '../helpers/imports';
import { postRecord } from '../helpers/records';

const { app, close } = createApp();
let curator: Agent;
const tag = runTag();
let ids: number[] = [];

beforeAll(async () => {
  curator = await agentFor(app, 'curator');
  const bodies = [
    { structure: 'CC(C)(C)OC(=O)N1CCC(CO)CC1', notes: `${tag} boc alcohol`, visualisation: ['KMnO4'] },
    {
      structure: 'NCc1ccc2OCOc2c1',
      eluent: 'DCM/MeOH 9:1 + 1% Et3N',
      technique: 'flash',
      outcome: 'partial',
      outcomeReason: 'tailing',
      spots: [
        { role: 'target', rf: 0.22 },
        { role: 'starting_material', rf: 0.61, lane: 'starting_material' },
      ],
      column: { diameterMm: 30, silicaG: 40, sampleMg: 850, loadMethod: 'dry', fractionMl: 20, yieldPercent: 71 },
      notebookRef: `${tag}-7`,
      notes: `${tag} amine`,
    },
    {
      structure: 'O=C(O)c1ccc(Br)cc1',
      eluent: 'hexanes/EtOAc 1:1 + 1% AcOH',
      visualisation: ['UV 254', 'bromocresol green'],
      notes: `${tag} acid`,
    },
  ];
  ids = [];
  for (const body of bodies) {
    const res = await postRecord(curator, body);
    expect(res.status).toBe(201);
    ids.push(res.body.id);
  }
});
afterAll(close);

describe('an export imported back (both written by server/features/search/export-format.ts)', () => {
  it('when the CSV export is imported, then every row is recognised as the record it came from and nothing is added', async () => {
    const { records } = await loadListRecords(ids);
    const done = await importFile(curator, toCsv(records), { name: 'export.csv' });
    expect(done).toMatchObject({ status: 'completed', total: 3, rejected: 0, accepted: 0, duplicates: 3 });
    expect(done.mapping).toMatchObject({
      compound: 'name',
      smiles: 'structure',
      eluent: 'eluent',
      additive: 'additive',
      rf: 'rf',
      'rf sm': 'rfStartingMaterial',
      stain: 'stain',
      'record id': 'recordId',
      formula: 'ignore',
      'MW (g/mol)': 'ignore',
    });
  });

  it('when the SDF export is imported, then the same holds', async () => {
    const { records } = await loadListRecords(ids, { withMolfile: true });
    const done = await importFile(curator, toSdf(records), { name: 'export.sdf' });
    expect(done).toMatchObject({
      status: 'completed',
      format: 'sdf',
      total: 3,
      rejected: 0,
      accepted: 0,
      duplicates: 3,
    });
  });
});
