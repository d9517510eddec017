import { SearchIndexes } from './search-indexes';

let started: Promise<SearchIndexes> | null = null;
let instance: SearchIndexes | null = null;

/**
 * The process-wide search indexes, built on first use (server/index.ts asks at start, so the first search
 * does not wait). A failed build (database down) is forgotten, so the next call tries again.
 */
export function searchIndexes(): Promise<SearchIndexes> {
  if (!started) {
    const indexes = new SearchIndexes();
    instance = indexes;
    started = indexes.start().then(
      () => indexes,
      async (error) => {
        started = null;
        instance = null;
        await indexes.stop();
        throw error;
      },
    );
  }
  return started;
}

/** The indexes, current as of now: every write committed before this call is in them. */
export async function currentSearchIndexes(): Promise<SearchIndexes> {
  const indexes = await searchIndexes();
  await indexes.sync();
  return indexes;
}

/** Stops listening (at shutdown and when a test's app closes). */
export async function stopSearchIndexes(): Promise<void> {
  const indexes = instance;
  started = null;
  instance = null;
  await indexes?.stop();
}
