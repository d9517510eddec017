import { describe, it } from 'vitest';
import { useFuzzApp } from '../helpers/fuzz/suite';
import { eluentCases, structureCases } from '../helpers/fuzz/families';
import { expectNoServerErrors } from '../helpers/fuzz/property';

const fuzzContext = useFuzzApp();

describe('hostile structures and eluents (fast-check; the 10,000-case run is `npm run bench:fuzz`)', () => {
  it('SMILES- and molfile-like text through parse, search, Scout and records: never a 5xx, every refusal says why', async () => {
    await expectNoServerErrors(fuzzContext(), structureCases(fuzzContext()), 90);
  });

  it('eluent notation as typed, through records, the eluent translator and Scout: never a 5xx, every refusal says why', async () => {
    await expectNoServerErrors(fuzzContext(), eluentCases(fuzzContext()), 50);
  });
});
