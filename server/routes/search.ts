import { Router } from 'express';
import { allow } from '../middleware/access';
import { handle } from '../middleware/validate';
import { searchQuerySchema } from '../../shared/schemas/search';
import { search } from '../services/search/search';
import { searchContributors } from '../services/search/contributors';

export const searchRouter = Router();

/** Text, similarity and substructure search over active records, with the shared filters; see services/search. */
searchRouter.get('/', allow('viewer'), handle({ query: searchQuerySchema }, async ({ query }, _req, res) => {
  res.json(await search(query));
}));

/** The people the contributor filter offers. */
searchRouter.get('/contributors', allow('viewer'), handle({}, async (_input, _req, res) => {
  res.json(await searchContributors());
}));
