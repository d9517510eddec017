import fc from 'fast-check';
import { expect } from 'vitest';
import { answerOf, type FuzzCase } from './cases';
import type { FuzzContext } from './context';
import { unexplained, verdictOf } from './verdict';

/**
 * Sends `runs` generated cases as the context's admin and fails on the first answer that is a 5xx or a 4xx
 * without `{ error: { code, message } }` saying why (fast-check then shrinks the input to a small one).
 * FUZZ_SEED replays a reported run.
 */
export async function expectNoServerErrors(ctx: FuzzContext, cases: fc.Arbitrary<FuzzCase>, runs: number) {
  const seed = process.env.FUZZ_SEED ? Number(process.env.FUZZ_SEED) : undefined;
  await fc.assert(
    fc.asyncProperty(cases, async (fuzzCase) => {
      const answer = answerOf(await fuzzCase.send(ctx.agent));
      const verdict = verdictOf(answer);
      const detail =
        `${fuzzCase.endpoint} ← ${fuzzCase.input}\n→ ${answer.status} ` +
        `${JSON.stringify(answer.body).slice(0, 400)} ${unexplained(answer) ?? ''}`;
      expect(verdict, detail).not.toBe('server_error');
      expect(verdict, detail).not.toBe('unexplained_refusal');
    }),
    { numRuns: runs, seed, endOnFailure: false, maxSkipsPerRun: 0 },
  );
}
