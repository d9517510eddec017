import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../server/http/app';
import { agentFor, type Agent } from '../helpers/agent';
import { postRecord } from '../helpers/records';
import { serveOnLoopback } from '../helpers/fuzz/context';
import sharp from 'sharp';

/** Failures the fuzz runs (tests/bench/fuzz.ts) found as 5xx or bare answers, each pinned here with its input. */
const { app, close } = createApp();
let member: Agent;
let curator: Agent;
let recordId: number;

beforeAll(async () => {
  [member, curator] = await Promise.all([agentFor(app, 'member'), agentFor(app, 'curator')]);
  recordId = (await postRecord(member)).body.id;
});
afterAll(close);

/** A multipart body whose part header has a line without a colon (what a file name with a bare CR/LF produces). */
const malformed = [
  '--XyZ',
  'Content-Disposition: form-data; name="photo"; filename="plate.png"',
  'this line is no header',
  '',
  'bytes',
  '--XyZ--',
  '',
].join('\r\n');

describe('uploads the multipart parser cannot read', () => {
  it.each([
    ['a photo', () => `/api/records/${recordId}/photos`, () => member],
    ['an import', () => '/api/imports?dryRun=1', () => curator],
  ])(
    'when %s arrives with a malformed part header, then 400 bad_upload with the parser’s reason (was 500)',
    async (_what, url, agent) => {
      const res = await agent()
        .post(url())
        .set('X-CSRF-Token', agent().csrf)
        .set('Content-Type', 'multipart/form-data; boundary=XyZ')
        .send(malformed);
      expect(res.status, JSON.stringify(res.body)).toBe(400);
      expect(res.body.error.code).toBe('bad_upload');
      expect(res.body.error.message).toMatch(/could not be read as multipart\/form-data \(Malformed part header\)/);
    },
  );
});

describe('columns named like JavaScript object properties', () => {
  it(
    'when a CSV has columns "constructor", "__proto__" and "toString" beside real ones, then the dry ' +
      'run maps each as a column of its own (was 500)',
    async () => {
      const csv = [
        'SMILES,Rf,Eluent,constructor,__proto__,toString',
        'OCc1ccccc1,0.3,EtOAc/hexanes 1:4,a,b,c',
        '',
      ].join('\n');
      const res = await curator
        .post('/api/imports?dryRun=1')
        .set('X-CSRF-Token', curator.csrf)
        .attach('file', Buffer.from(csv), 'history.csv');
      expect(res.status, JSON.stringify(res.body)).toBe(200);
      expect(Object.keys(res.body.mapping)).toEqual(['SMILES', 'Rf', 'Eluent', 'constructor', '__proto__', 'toString']);
      expect(Object.values(res.body.mapping).every((target) => typeof target === 'string')).toBe(true);
      expect(res.body.mapping.SMILES).toBe('structure');
    },
  );

  it('when an SD file carries a data item called "__proto__", then it is a column like any other', async () => {
    const sdf = [
      '',
      '  Rfolio',
      '',
      '  1  0  0  0  0  0  0  0  0  0999 V2000',
      '    0.0000    0.0000    0.0000 C   0  0  0  0  0  0  0  0  0  0  0  0',
      'M  END',
      '> <__proto__>',
      'odd',
      '',
      '> <Rf>',
      '0.4',
      '',
      '$$$$',
      '',
    ].join('\n');
    const res = await curator
      .post('/api/imports?dryRun=1')
      .set('X-CSRF-Token', curator.csrf)
      .attach('file', Buffer.from(sdf), 'history.sdf');
    expect(res.status, JSON.stringify(res.body)).toBe(200);
    expect(res.body.headers).toContain('__proto__');
  });
});

describe('a photo whose header reads but whose pixels do not', () => {
  it('when a PNG is cut short after its header, then 422 saying it cannot be decoded (was 500), and no photo is added', async () => {
    // Patterned pixels, so the image data is long enough that half the file keeps the header but not the pixels.
    const pixels = Buffer.from(Array.from({ length: 64 * 64 * 3 }, (_, i) => (i * 7919) % 251));
    const png = await sharp(pixels, { raw: { width: 64, height: 64, channels: 3 } })
      .png()
      .toBuffer();
    const res = await member
      .post(`/api/records/${recordId}/photos`)
      .set('X-CSRF-Token', member.csrf)
      .attach('photo', png.subarray(0, png.length / 2), 'plate.png');
    expect(res.status, JSON.stringify(res.body)).toBe(422);
    expect(res.body.error.message).toMatch(/starts like image\/png but its image data cannot be decoded/);
    expect((await member.get(`/api/records/${recordId}`)).body.photos).toEqual([]);
  });
});

describe('requests Node refuses before the app sees them (server/http/http-server.ts)', () => {
  it(
    'when the request line and headers exceed 96 KB, then 431 in the JSON error shape; a 19 KB search ' +
      'URL (over Node’s default 16 KB) reaches the app',
    async () => {
      const served = await serveOnLoopback(app);
      try {
        const long = await request(served.base).get(`/api/search?q=${'a'.repeat(100 * 1024)}`);
        expect(long.status).toBe(431);
        expect(long.headers['content-type']).toMatch(/json/);
        expect(long.body.error).toMatchObject({ code: 'headers_too_large' });
        expect(long.body.error.message).toMatch(/exceed 96 KB/);
        // Longer than Node's default 16 KB: the 20,000-character structure limit of GET /api/search is reachable.
        const ok = await request(served.base)
          .get(`/api/search?mode=similar&structure=${encodeURIComponent('C'.repeat(19_000))}`)
          .set('Cookie', 'x=1');
        expect(ok.status).toBe(401);
        expect(ok.body.error.code).toBe('unauthenticated');
      } finally {
        await served.stop();
      }
    },
  );
});
