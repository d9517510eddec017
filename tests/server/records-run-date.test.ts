import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../server/http/app';
import { recordDtoSchema, recordHistorySchema } from '../../shared/schemas/record';
import { agentFor, type Agent } from '../helpers/agent';
import { postRecord } from '../helpers/records';

const { app, close } = createApp();
let member: Agent;

beforeAll(async () => {
  member = await agentFor(app, 'member');
});
afterAll(close);

const tomorrowPlusOne = () => new Date(Date.now() + 3 * 86_400_000).toISOString().slice(0, 10);

describe('the date a plate was run', () => {
  it('when a record gives the day its plate was run, then the record keeps it apart from the day it was typed in', async () => {
    const res = await postRecord(member, { runOn: '2026-03-17' });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    const record = recordDtoSchema.parse((await member.get(`/api/records/${res.body.id}`)).body);
    expect(record.runOn).toBe('2026-03-17');
    expect(record.createdAt.slice(0, 10)).not.toBe('2026-03-17');
  });

  it('when no date is given, then the record says nothing about it (null), as records from before the field do', async () => {
    const res = await postRecord(member);
    expect(res.status).toBe(201);
    expect(recordDtoSchema.parse((await member.get(`/api/records/${res.body.id}`)).body).runOn).toBeNull();
  });

  it('when the date is in the future or not a date, then 400 names the field and nothing is saved', async () => {
    for (const runOn of [tomorrowPlusOne(), '17/03/2026', '2026-02-30']) {
      const res = await postRecord(member, { runOn });
      expect(res.status, runOn).toBe(400);
      expect(res.body.error.code).toBe('invalid_input');
      expect(JSON.stringify(res.body.error.details)).toContain('runOn');
    }
  });

  it('when the date is corrected, then the history shows the change', async () => {
    const res = await postRecord(member, { runOn: '2026-03-17' });
    const patch = await member
      .patch(`/api/records/${res.body.id}`)
      .set('X-CSRF-Token', member.csrf)
      .send({ runOn: '2026-03-16' });
    expect(patch.status, JSON.stringify(patch.body)).toBe(200);
    const history = recordHistorySchema.parse((await member.get(`/api/records/${res.body.id}/history`)).body);
    expect(history.revisions[0].changes).toEqual([{ field: 'runOn', from: '2026-03-17', to: '2026-03-16' }]);
  });
});
