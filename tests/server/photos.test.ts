import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import sharp from 'sharp';
import { createApp } from '../../server/http/app';
import { agentFor, type Agent } from '../helpers/agent';
import { postRecord } from '../helpers/records';

const { app, close } = createApp();
let owner: Agent;
let otherMember: Agent;
let curator: Agent;
let viewer: Agent;
let recordId: number;

/** A real image of a plate-like strip, encoded by sharp (libvips) — not a fixture file. */
function plateImage(format: 'png' | 'jpeg' | 'webp', width = 240, height = 640) {
  return sharp({ create: { width, height, channels: 3, background: { r: 236, g: 240, b: 232 } } })
    [format]()
    .toBuffer();
}

const upload = (agent: Agent, id: number, bytes: Buffer, filename: string, contentType = 'image/png') =>
  agent
    .post(`/api/records/${id}/photos`)
    .set('X-CSRF-Token', agent.csrf)
    .attach('photo', bytes, { filename, contentType });

beforeAll(async () => {
  [owner, otherMember, curator, viewer] = await Promise.all([
    agentFor(app, 'member'),
    agentFor(app, 'member'),
    agentFor(app, 'curator'),
    agentFor(app, 'viewer'),
  ]);
  recordId = (await postRecord(owner)).body.id;
});
afterAll(close);

describe('POST /api/records/:id/photos', () => {
  it.each(['png', 'jpeg', 'webp'] as const)(
    'when the author uploads a %s, then 201 with its size, dimensions and URLs',
    async (format) => {
      const bytes = await plateImage(format);
      const res = await upload(owner, recordId, bytes, `plate.${format}`, `image/${format}`);
      expect(res.status).toBe(201);
      expect(res.body).toMatchObject({
        contentType: `image/${format}`,
        width: 240,
        height: 640,
        byteSize: bytes.length,
      });
      expect(res.body.thumbUrl).toBe(`/api/photos/${res.body.id}?size=thumb`);
    },
  );

  it('when a text file is named .png and declared image/png, then 415 (the content decides)', async () => {
    const res = await upload(
      owner,
      recordId,
      Buffer.from('this is not an image\n'.repeat(20)),
      'plate.png',
      'image/png',
    );
    expect(res.status).toBe(415);
  });

  it('when a real image of another format is sent (GIF), then 415', async () => {
    const gif = await sharp({ create: { width: 10, height: 10, channels: 3, background: '#fff' } })
      .gif()
      .toBuffer();
    expect((await upload(owner, recordId, gif, 'plate.jpg', 'image/jpeg')).status).toBe(415);
  });

  it('when the file is larger than 10 MB, then 413', async () => {
    const big = Buffer.alloc(10 * 1024 * 1024 + 1, 0xff);
    expect((await upload(owner, recordId, big, 'big.png')).status).toBe(413);
  });

  it('when no file is attached, then 400', async () => {
    const res = await owner.post(`/api/records/${recordId}/photos`).set('X-CSRF-Token', owner.csrf).field('note', 'x');
    expect(res.status).toBe(400);
  });

  it('when another member or a viewer uploads, then 403; a curator may', async () => {
    const bytes = await plateImage('png');
    expect((await upload(otherMember, recordId, bytes, 'p.png')).status).toBe(403);
    expect((await upload(viewer, recordId, bytes, 'p.png')).status).toBe(403);
    expect((await upload(curator, recordId, bytes, 'p.png')).status).toBe(201);
  });

  it('when a photo is added, then the record lists it and its history says so', async () => {
    const res = await upload(owner, recordId, await plateImage('png', 120, 300), 'plate.png');
    const record = (await viewer.get(`/api/records/${recordId}`)).body;
    expect(record.photos.map((photo: { id: number }) => photo.id)).toContain(res.body.id);
    const history = (await viewer.get(`/api/records/${recordId}/history`)).body;
    expect(history.revisions[0]).toMatchObject({
      action: 'photo-add',
      changes: [{ field: 'photos', from: null, to: res.body.id }],
    });
  });
});

describe('GET /api/photos/:id', () => {
  it('when read, then the bytes come back with their content type, an ETag and caching headers; If-None-Match gives 304', async () => {
    const bytes = await plateImage('jpeg');
    const { id } = (await upload(owner, recordId, bytes, 'plate.jpg', 'image/jpeg')).body;
    const res = await viewer.get(`/api/photos/${id}`).buffer(true);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toBe('image/jpeg');
    expect(Buffer.compare(res.body as Buffer, bytes)).toBe(0);
    expect(res.headers.etag).toMatch(/^"[0-9a-f]{64}"$/);
    expect(res.headers['cache-control']).toMatch(/max-age=\d+/);
    const again = await viewer.get(`/api/photos/${id}`).set('If-None-Match', res.headers.etag);
    expect(again.status).toBe(304);
  });

  it('when the thumbnail is asked for, then a WebP no larger than 320 px that keeps the aspect ratio', async () => {
    const { id } = (await upload(owner, recordId, await plateImage('png', 400, 1000), 'tall.png')).body;
    const res = await viewer.get(`/api/photos/${id}?size=thumb`).buffer(true);
    expect(res.headers['content-type']).toBe('image/webp');
    const meta = await sharp(res.body as Buffer).metadata();
    expect(meta.format).toBe('webp');
    expect(meta.height).toBe(320);
    expect(meta.width).toBe(128); // 400 × 320 / 1000
  });

  it('when the photo does not exist, then 404', async () => {
    expect((await viewer.get('/api/photos/999999999')).status).toBe(404);
  });
});

describe('DELETE /api/photos/:id', () => {
  it(
    'when another member removes it, then 403; when the author does, then 204 and it is gone from ' +
      'the record but kept in history',
    async () => {
      const { id } = (await upload(owner, recordId, await plateImage('png'), 'gone.png')).body;
      expect((await otherMember.delete(`/api/photos/${id}`).set('X-CSRF-Token', otherMember.csrf)).status).toBe(403);
      expect((await owner.delete(`/api/photos/${id}`).set('X-CSRF-Token', owner.csrf)).status).toBe(204);
      expect((await viewer.get(`/api/photos/${id}`)).status).toBe(404);
      const record = (await viewer.get(`/api/records/${recordId}`)).body;
      expect(record.photos.map((photo: { id: number }) => photo.id)).not.toContain(id);
      const history = (await viewer.get(`/api/records/${recordId}/history`)).body;
      expect(history.revisions[0]).toMatchObject({
        action: 'photo-remove',
        changes: [{ field: 'photos', from: id, to: null }],
      });
    },
  );
});
