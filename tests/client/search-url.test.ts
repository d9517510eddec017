import { describe, expect, it } from 'vitest';
import { searchApiParams, searchStateOf } from '../../src/features/search/hooks/use-search-url';

describe('the search state in the URL', () => {
  it(
    'when a similarity search with filters is read back, then the API query carries the same words, ' +
      'structure, threshold and filters',
    () => {
      const state = searchStateOf(
        new URLSearchParams(
          'mode=similar&structure=OCc1ccccc1&threshold=0.6&q=Et3N&outcome=clean&class=alcohol&view=compounds&page=2',
        ),
      );
      const api = searchApiParams(state);
      expect(Object.fromEntries(api)).toEqual({
        mode: 'similar',
        q: 'Et3N',
        structure: 'OCc1ccccc1',
        threshold: '0.6',
        outcome: 'clean',
        class: 'alcohol',
        sort: 'relevance',
        view: 'compounds',
        page: '2',
        pageSize: '25',
      });
    },
  );

  it('when the mode is words, then a leftover structure and threshold are not sent', () => {
    const api = searchApiParams(
      searchStateOf(new URLSearchParams('mode=text&structure=c1ccccc1&threshold=0.9&q=benzyl')),
    );
    expect(api.has('structure')).toBe(false);
    expect(api.has('threshold')).toBe(false);
  });

  it('when the URL holds nonsense, then the defaults stand in (words, records, best match, page 1)', () => {
    const state = searchStateOf(new URLSearchParams('mode=fuzzy&view=cards&sort=random&page=-3&pageSize=100000'));
    expect(state).toMatchObject({ mode: 'text', view: 'records', sort: 'relevance', page: 1, pageSize: 200 });
  });

  it('when an export link is built, then it has no page, page size or view (every matching record is exported)', () => {
    const api = searchApiParams(searchStateOf(new URLSearchParams('q=benzyl&page=3&view=compounds')), { paged: false });
    expect([...api.keys()].sort()).toEqual(['mode', 'q', 'sort']);
  });
});
