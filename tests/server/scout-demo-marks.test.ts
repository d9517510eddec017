import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/http/app';
import { sequelize } from '../../server/db/sequelize';
import { agentFor, type Agent } from '../helpers/agent';
import { postRecord } from '../helpers/records';
import { scoutResultSchema } from '../../shared/schemas/scout';
import { overviewSchema } from '../../shared/schemas/overview';
import { classDetailSchema } from '../../shared/schemas/classes';

/**
 * Issue 19, point 3: demo data is invented, so wherever Scout, the class charts and the home counts cite a demo
 * record, they say so (as the record pages do). Two records of a nitrile are written through the API, then one is
 * flagged as demo the way the demo seeder stores it (condition_records.demo), before anything reads them.
 */
const { app, close } = createApp();
let viewer: Agent;
let demoId: number;
let realId: number;

beforeAll(async () => {
  const member = await agentFor(app, 'member');
  viewer = await agentFor(app, 'viewer');
  const eluent = (etoac: number, hex: number) => ({
    components: [
      { solvent: 'EtOAc', parts: etoac },
      { solvent: 'hexanes', parts: hex },
    ],
    additives: [],
  });
  const demo = await postRecord(member, {
    structure: 'N#CCCCCc1ccc(OC)cc1',
    eluent: eluent(1, 4),
    spots: [{ role: 'target', rf: 0.31 }],
    notes: null,
  });
  const real = await postRecord(member, {
    structure: 'N#CCCCCc1ccc(C)cc1',
    eluent: eluent(1, 4),
    spots: [{ role: 'target', rf: 0.36 }],
    notes: null,
  });
  expect([demo.status, real.status]).toEqual([201, 201]);
  demoId = demo.body.id;
  realId = real.body.id;
  await sequelize.query('UPDATE condition_records SET demo = true, updated_at = now() WHERE id = :id', {
    replacements: { id: demoId },
  });
});
afterAll(close);

describe('demo records are marked as demo', () => {
  it(
    'when Scout cites a demo record among the neighbours, then that condition carries the demo flag ' +
      'and the real one does not',
    async () => {
      const res = await viewer
        .post('/api/scout')
        .set('X-CSRF-Token', viewer.csrf)
        .send({ structure: 'N#CCCCCc1ccc(Cl)cc1' });
      expect(res.status).toBe(200);
      const conditions = scoutResultSchema.parse(res.body).neighbours.flatMap((item) => item.conditions);
      expect(conditions.find((item) => item.recordId === demoId)?.demo).toBe(true);
      expect(conditions.find((item) => item.recordId === realId)?.demo).toBe(false);
    },
  );

  it('when the home counts are read, then they say how many of the records are demo data', async () => {
    const overview = overviewSchema.parse((await viewer.get('/api/overview')).body);
    expect(overview.demoRecords).toBeGreaterThanOrEqual(1);
    expect(overview.demoRecords).toBeLessThan(overview.records.total);
  });

  it('when a class chart plots the records, then the demo record’s point is flagged and the real one is not', async () => {
    const detail = classDetailSchema.parse((await viewer.get('/api/classes/nitrile')).body);
    expect(detail.strength.points.find((point) => point.recordId === demoId)?.demo).toBe(true);
    expect(detail.strength.points.find((point) => point.recordId === realId)?.demo).toBe(false);
  });
});
