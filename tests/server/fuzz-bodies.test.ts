import { describe, it } from 'vitest';
import { useFuzzApp } from '../helpers/fuzz/suite';
import { bodyCases, pathCases, rawCases } from '../helpers/fuzz/families';
import { expectNoServerErrors } from '../helpers/fuzz/property';

const fuzzContext = useFuzzApp();

describe('hostile requests to every route of the route table (fast-check; the 10,000-case run is `npm run bench:fuzz`)', () => {
  it('JSON bodies of the wrong shape for every POST and PATCH route: never a 5xx, every refusal says why', async () => {
    await expectNoServerErrors(fuzzContext(), bodyCases(fuzzContext()), 90);
  });

  it('bodies that are not JSON, or too large or too deep, for every write route: never a 5xx, every refusal says why', async () => {
    await expectNoServerErrors(fuzzContext(), rawCases(fuzzContext()), 25);
  });

  it('hostile path parameters and query strings on GET routes: never a 5xx, every refusal says why', async () => {
    await expectNoServerErrors(fuzzContext(), pathCases(fuzzContext()), 45);
  });
});
