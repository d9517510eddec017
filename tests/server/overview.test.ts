import { afterAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/http/app';
import { sequelize } from '../../server/db/sequelize';
import { overviewSchema } from '../../shared/schemas/overview';
import { agentFor } from '../helpers/agent';
import { createRecord } from '../helpers/search';

const { app, close } = createApp();
afterAll(close);

describe('GET /api/overview', () => {
  it(
    'when a new member records a new compound this month and an older record is backdated, then totals ' +
      'and this month’s counts move by exactly that',
    async () => {
      const viewer = await agentFor(app, 'viewer');
      const member = await agentFor(app, 'member');
      const before = overviewSchema.parse((await viewer.get('/api/overview')).body);
      await createRecord(member, { structure: 'CCCCCCCCCCCCCCCCCCCCCCCCCCCCCCCCCCCCC(=O)O', name: 'overview acid' });
      const old = await createRecord(member, {
        structure: 'CCCCCCCCCCCCCCCCCCCCCCCCCCCCCCCCCCCCCC(=O)O',
        name: 'older overview acid',
      });
      await sequelize.query("UPDATE condition_records SET created_at = now() - interval '400 days' WHERE id = :id", {
        replacements: { id: old.id },
      });
      const after = overviewSchema.parse((await viewer.get('/api/overview')).body);
      expect(after.records.total - before.records.total).toBe(2);
      expect(after.records.thisMonth - before.records.thisMonth).toBe(1);
      expect(after.compounds.total - before.compounds.total).toBe(2);
      expect(after.compounds.thisMonth - before.compounds.thisMonth).toBe(1);
      expect(after.contributors.total - before.contributors.total).toBe(1);
      expect(new Date(after.monthStart).getUTCDate()).toBe(1);
    },
  );

  it('when nobody is signed in, then 401', async () => {
    expect((await (await agentFor(app)).get('/api/overview')).status).toBe(401);
  });
});
