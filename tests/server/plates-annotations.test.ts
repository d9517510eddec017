import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import sharp from 'sharp';
import { createApp } from '../../server/http/app';
import { photoAnnotationSchema, type PlateAnnotation } from '../../shared/schemas/plates';
import { agentFor, type Agent } from '../helpers/agent';
import { postRecord } from '../helpers/records';

const { app, close } = createApp();
let author: Agent;
let other: Agent;
let viewer: Agent;
let photoId: number;

const annotation = (rf: number): PlateAnnotation => ({
  plates: [
    {
      corners: [
        [10, 10],
        [110, 10],
        [110, 310],
        [10, 310],
      ],
      origin: [
        [10, 280],
        [110, 280],
      ],
      front: [
        [10, 30],
        [110, 30],
      ],
      lanes: [
        {
          x: 60,
          label: 'RM',
          role: 'mixture',
          spots: [{ x: 60, y: 280 - rf * 250, rf, kind: 'spot', role: 'target' }],
        },
      ],
    },
  ],
  monitoring: ['New spot at Rf 0.30.'],
});
const put = (agent: Agent, body: object) =>
  agent.put(`/api/plates/photos/${photoId}/annotation`).set('X-CSRF-Token', agent.csrf).send(body);

beforeAll(async () => {
  [author, other, viewer] = await Promise.all([
    agentFor(app, 'member'),
    agentFor(app, 'member'),
    agentFor(app, 'viewer'),
  ]);
  const recordId = (await postRecord(author)).body.id;
  const bytes = await sharp({
    create: { width: 120, height: 320, channels: 3, background: { r: 236, g: 236, b: 230 } },
  })
    .png()
    .toBuffer();
  const upload = await author
    .post(`/api/records/${recordId}/photos`)
    .set('X-CSRF-Token', author.csrf)
    .attach('photo', bytes, { filename: 'plate.png', contentType: 'image/png' });
  photoId = upload.body.id;
});
afterAll(close);

describe('plate annotations on a record photo', () => {
  it('when nothing was saved yet, then 404', async () => {
    expect((await viewer.get(`/api/plates/photos/${photoId}/annotation`)).status).toBe(404);
  });

  it('when the author saves twice, then two revisions are kept and the newest is current', async () => {
    const first = await put(author, annotation(0.3));
    expect(first.status).toBe(200);
    expect(photoAnnotationSchema.parse(first.body).revision).toBe(1);
    const second = await put(author, annotation(0.34));
    expect(second.body.revision).toBe(2);
    const current = await viewer.get(`/api/plates/photos/${photoId}/annotation`);
    expect(current.body.annotation.plates[0].lanes[0].spots[0].rf).toBe(0.34);
    const history = await viewer.get(`/api/plates/photos/${photoId}/annotation/revisions`);
    expect(history.body.items.map((item: { revision: number }) => item.revision)).toEqual([2, 1]);
    expect(history.body.items[1].annotation.plates[0].lanes[0].spots[0].rf).toBe(0.3);
  });

  it('when another member or a viewer saves, then 403', async () => {
    expect((await put(other, annotation(0.5))).status).toBe(403);
    expect((await put(viewer, annotation(0.5))).status).toBe(403);
  });

  it('when the annotation is malformed, then 400 naming the field', async () => {
    const res = await put(author, { plates: [{ corners: [[0, 0]], origin: [], front: [], lanes: [] }] });
    expect(res.status).toBe(400);
    expect(res.body.error.message).toContain('body.plates.0.corners');
  });

  it('when the photo does not exist, then 404', async () => {
    expect(
      (
        await author
          .put('/api/plates/photos/99999999/annotation')
          .set('X-CSRF-Token', author.csrf)
          .send(annotation(0.3))
      ).status,
    ).toBe(404);
  });
});
