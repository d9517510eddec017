import { afterAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/http/app';
import { agentFor } from '../helpers/agent';
import { startPostgres, stopPostgres } from '../helpers/pg-control';

const { app, close } = createApp();
afterAll(close);

describe('when PostgreSQL goes away and comes back', () => {
  it('answers 503 meanwhile, then recovers without restarting the app, and sessions survive', async () => {
    const member = await agentFor(app, 'member');
    expect((await request(app).get('/api/health')).status).toBe(200);

    stopPostgres();
    try {
      const health = await request(app).get('/api/health');
      expect(health.status).toBe(503);
      expect(health.body).toMatchObject({ db: 'down' });
      const me = await member.get('/api/auth/me');
      expect(me.status).toBe(503);
      expect(me.body.error.code).toBe('database_unavailable');
    } finally {
      startPostgres();
    }

    let healthy = 0;
    for (let i = 0; i < 50 && healthy !== 200; i++) {
      healthy = (await request(app).get('/api/health')).status;
      if (healthy !== 200) await new Promise((r) => setTimeout(r, 200));
    }
    expect(healthy).toBe(200);
    const me = await member.get('/api/auth/me');
    expect(me.status).toBe(200);
    expect(me.body.user.email).toBe(member.user!.email);
  });

  it('keeps a signed-in user signed in across a server restart (sessions live in PostgreSQL)', async () => {
    const member = await agentFor(app, 'viewer');
    const second = createApp();
    try {
      const cookies = (await member.get('/api/auth/csrf')).request.cookies;
      const me = await request(second.app).get('/api/auth/me').set('Cookie', cookies);
      expect(me.body.user?.email).toBe(member.user!.email);
    } finally {
      await second.close();
    }
  });
});
