import { Router } from 'express';
import multer from 'multer';
import { allow, currentUser } from '../../http/middleware/access';
import { handle } from '../../http/middleware/validate';
import { readableMultipart } from '../../http/middleware/multipart';
import { idParamSchema } from '../../../shared/schemas/common';
import { recordInputSchema, recordListQuerySchema, recordUpdateSchema } from '../../../shared/schemas/record';
import { createRecord, updateRecord, canEditRecord } from './service';
import { listRecordIds, loadFullRecord, loadListRecords } from '../../core/record-queries';
import { recordHistory } from './history';
import { addPhoto, MAX_PHOTO_BYTES } from './photos';
import { presentPhoto, presentRecord, presentRecordListItem } from '../../core/record-presenter';
import { BadRequestError } from '../../http/errors';
import { requestContentStamp } from '../../db/data-stamp';
import { jsonBody, responseCache, sendJsonBody, StampedCache } from '../../http/read-cache';

export const recordsRouter = Router();

const upload = multer({ storage: multer.memoryStorage(), limits: { fileSize: MAX_PHOTO_BYTES, files: 1 } });

async function recordResponse(id: number, user: Parameters<typeof canEditRecord>[0]) {
  const record = await loadFullRecord(id);
  return presentRecord(record, canEditRecord(user, record));
}

/** Records as their page reads them, at a content stamp (the page's answer differs only in `canEdit`). */
const fullRecords = new StampedCache<Awaited<ReturnType<typeof loadFullRecord>>>({ max: 5_000 });

/** The same list for everyone who may read it: kept per content stamp (db/data-stamp.ts), so never stale after a content write. */
recordsRouter.get(
  '/',
  allow('viewer'),
  handle({ query: recordListQuerySchema }, async ({ query }, req, res) => {
    const stamp = await requestContentStamp(req);
    sendJsonBody(
      res,
      await responseCache.get(`records:${JSON.stringify(query)}`, stamp, async () => {
        const { ids, total } = await listRecordIds(query);
        const { records, photoCounts } = await loadListRecords(ids);
        return jsonBody({
          items: records.map((record) => presentRecordListItem(record, photoCounts.get(record.id) ?? 0)),
          total,
          page: query.page,
          pageSize: query.pageSize,
        });
      }),
    );
  }),
);

recordsRouter.post(
  '/',
  allow('member'),
  handle({ body: recordInputSchema }, async ({ body }, req, res) => {
    const user = currentUser(req);
    const record = await createRecord(body, user);
    res
      .status(201)
      .location(`/api/records/${record.id}`)
      .json(await recordResponse(record.id, user));
  }),
);

recordsRouter.get(
  '/:id',
  allow('viewer'),
  handle({ params: idParamSchema }, async ({ params }, req, res) => {
    const stamp = await requestContentStamp(req);
    const record = await fullRecords.get(String(params.id), stamp, () => loadFullRecord(params.id));
    const canEdit = canEditRecord(req.user, record);
    sendJsonBody(
      res,
      await responseCache.get(`record:${params.id}:${canEdit}`, stamp, () =>
        jsonBody(presentRecord(structuredClone(record), canEdit)),
      ),
    );
  }),
);

recordsRouter.patch(
  '/:id',
  allow('member'),
  handle({ params: idParamSchema, body: recordUpdateSchema }, async ({ params, body }, req, res) => {
    const user = currentUser(req);
    await updateRecord(params.id, body, user);
    res.json(await recordResponse(params.id, user));
  }),
);

recordsRouter.get(
  '/:id/history',
  allow('viewer'),
  handle({ params: idParamSchema }, async ({ params }, _req, res) => {
    res.json(await recordHistory(params.id));
  }),
);

recordsRouter.post(
  '/:id/photos',
  allow('member'),
  readableMultipart(upload.single('photo')),
  handle({ params: idParamSchema }, async ({ params }, req, res) => {
    if (!req.file) throw new BadRequestError('Attach the photo as multipart field "photo".');
    const user = currentUser(req);
    const photo = await addPhoto(params.id, req.file, user);
    res.status(201).location(`/api/photos/${photo.id}`).json(presentPhoto(photo, user.name));
  }),
);
