import { Router } from 'express';
import { allow, currentUser } from '../../http/middleware/access';
import { handle } from '../../http/middleware/validate';
import { idParamSchema } from '../../../shared/schemas/common';
import { bookmarkInputSchema, bookmarkTargetSchema, bookmarkUpdateSchema } from '../../../shared/schemas/bookmark';
import { ValidationError } from '../../http/errors';
import { addBookmark, listBookmarks, removeBookmark, removeBookmarkOf, updateBookmarkNote } from './service';

/** A user's own bookmarks of records and compounds; viewers may bookmark too. */
export const bookmarksRouter = Router();

bookmarksRouter.get('/', allow('viewer'), handle({}, async (_input, req, res) => {
  res.set('Cache-Control', 'no-store').json({ items: await listBookmarks(currentUser(req).id) });
}));

bookmarksRouter.post('/', allow('viewer'), handle({ body: bookmarkInputSchema }, async ({ body }, req, res) => {
  res.status(201).json(await addBookmark(currentUser(req).id, body));
}));

bookmarksRouter.patch('/:id', allow('viewer'), handle({ params: idParamSchema, body: bookmarkUpdateSchema }, async ({ params, body }, req, res) => {
  res.json(await updateBookmarkNote(currentUser(req).id, params.id, body.note));
}));

bookmarksRouter.delete('/:id', allow('viewer'), handle({ params: idParamSchema }, async ({ params }, req, res) => {
  await removeBookmark(currentUser(req).id, params.id);
  res.status(204).end();
}));

/** Removes the bookmark of `?recordId=` or `?compoundId=` (also accepted in the body), for toggles that know only the target. */
bookmarksRouter.delete('/', allow('viewer'), handle({}, async (_input, req, res) => {
  const target = bookmarkTargetSchema.safeParse({ ...(req.body ?? {}), ...req.query });
  if (!target.success) {
    const details = target.error.issues.map((issue) => ({ path: ['query', ...issue.path.map(String)].join('.'), message: issue.message }));
    throw new ValidationError(`${details[0].path}: ${details[0].message}`, details);
  }
  await removeBookmarkOf(currentUser(req).id, target.data);
  res.status(204).end();
}));
