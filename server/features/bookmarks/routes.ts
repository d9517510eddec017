import { Router } from 'express';
import { allow, currentUser } from '../../http/middleware/access';
import { handle } from '../../http/middleware/validate';
import { idParamSchema } from '../../../shared/schemas/common';
import { bookmarkInputSchema, bookmarkTargetSchema, bookmarkUpdateSchema } from '../../../shared/schemas/bookmark';
import { addBookmark, listBookmarks, removeBookmark, removeBookmarkOf, updateBookmarkNote } from './service';

/** A user's own bookmarks of records and compounds; viewers may bookmark too. */
export const bookmarksRouter = Router();

bookmarksRouter.get(
  '/',
  allow('viewer'),
  handle({}, async (_input, req, res) => {
    res.set('Cache-Control', 'no-store').json({ items: await listBookmarks(currentUser(req).id) });
  }),
);

bookmarksRouter.post(
  '/',
  allow('viewer'),
  handle({ body: bookmarkInputSchema }, async ({ body }, req, res) => {
    res.status(201).json(await addBookmark(currentUser(req).id, body));
  }),
);

bookmarksRouter.patch(
  '/:id',
  allow('viewer'),
  handle({ params: idParamSchema, body: bookmarkUpdateSchema }, async ({ params, body }, req, res) => {
    res.json(await updateBookmarkNote(currentUser(req).id, params.id, body.note));
  }),
);

bookmarksRouter.delete(
  '/:id',
  allow('viewer'),
  handle({ params: idParamSchema }, async ({ params }, req, res) => {
    await removeBookmark(currentUser(req).id, params.id);
    res.status(204).end();
  }),
);

/** Removes the bookmark of `?recordId=` or `?compoundId=`, for toggles that know only the target. */
bookmarksRouter.delete(
  '/',
  allow('viewer'),
  handle({ query: bookmarkTargetSchema }, async ({ query }, req, res) => {
    await removeBookmarkOf(currentUser(req).id, query);
    res.status(204).end();
  }),
);
