import { afterAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/http/app';

const { app, close } = createApp();
afterAll(close);

describe('GET /api/health', () => {
  it('when the database is up, then 200 with db "up" and the package version', async () => {
    const res = await request(app).get('/api/health');
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({ status: 'ok', db: 'up' });
    expect(res.body.version).toMatch(/^\d+\.\d+\.\d+/);
  });

  it('when a route does not exist, then 404 in the one JSON error shape', async () => {
    const res = await request(app).get('/api/no-such-thing');
    expect(res.status).toBe(404);
    expect(res.body.error).toMatchObject({ code: 'not_found' });
    expect(typeof res.body.error.message).toBe('string');
  });

  it('when a JSON body is malformed, then 400 bad_json rather than a crash', async () => {
    const res = await request(app).post('/api/auth/login').set('Content-Type', 'application/json').send('{"email":');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('bad_json');
  });
});
