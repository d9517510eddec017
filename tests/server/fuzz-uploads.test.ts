import { describe, it } from 'vitest';
import { useFuzzApp } from '../helpers/fuzz/suite';
import { csvCases, uploadCases } from '../helpers/fuzz/families';
import { expectNoServerErrors } from '../helpers/fuzz/property';

const fuzzContext = useFuzzApp();

describe('hostile files (fast-check; the 10,000-case run is `npm run bench:fuzz`)', () => {
  it(
    'CSV-like files with odd delimiters, quotes, BOMs and huge fields, previewed and imported: never ' +
      'a 5xx, every refusal says why',
    async () => {
      await expectNoServerErrors(fuzzContext(), csvCases(), 40);
    },
    120_000,
  ); // each case imports a file end to end; the default 30 s is too tight on a busy 2-core host

  it(
    'photos and imports of the wrong type, size or field, with path-like and NUL-bearing names: never ' +
      'a 5xx, every refusal says why',
    async () => {
      await expectNoServerErrors(fuzzContext(), uploadCases(fuzzContext()), 30);
    },
    120_000,
  );
});
