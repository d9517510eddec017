/**
 * `npm run eval:scout` — measured accuracy of Scout on the open TLC data (H. Xu, J. Lin, D. Zhang, F. Mo et al.,
 * Chem 2022, arXiv 2202.05962; Apache-2.0; tests/fixtures/open-tlc). Default: leave one compound out at a time
 * from tlc-rf.csv — the model is rebuilt from the other compounds only (the engine the API uses, server/features/scout/engine)
 * and predicts each of the held-out compound's Rf values. `--train FILE --test FILE`: learn from one file and
 * predict every compound of the other (compounds present in both are left out of the training set).
 * Prints MAE, the structure-blind baseline (mean Rf per eluent, from the same training compounds) and the hit
 * rate; the last line is `MAE=<number> hit=<fraction> coverage90=<fraction>`.
 * `--split`: the fixed compound split of the engine README (distinct SMILES of tlc-rf.csv numbered from 0 in file
 * order; number mod 4 = 3 is the test part), learning from the rest. `--tune`: leave one compound out within the
 * split's training part only — the run to choose settings by, so the split's test part stays out of all tuning.
 */
import { resolve } from 'node:path';
import { parseArgs } from 'node:util';
import { fixedSplit, openTlcKnowledge, withoutCompound } from './open-tlc-knowledge';
import { foldOf, scoreCompound, summarise, hitWindow, type CompoundScore } from './scout-scoring';
import type { KnowledgeSet } from '../../server/features/scout/engine/types';
import { closeFingerprintPool } from '../../server/chem';
import { transferCeilings } from './transfer-ceiling';

const { values } = parseArgs({
  options: {
    train: { type: 'string' },
    test: { type: 'string' },
    split: { type: 'boolean' },
    tune: { type: 'boolean' },
  },
});
if (Boolean(values.train) !== Boolean(values.test))
  throw new Error('Give both --train FILE and --test FILE, or neither.');

const started = Date.now();
const scores: CompoundScore[] = [];
const progress = (done: number, total: number) => {
  if (done % 25 === 0 || done === total)
    process.stderr.write(`  ${done}/${total} compounds, ${((Date.now() - started) / 1000).toFixed(0)} s\n`);
};

const openDataPath = resolve('tests/fixtures/open-tlc/tlc-rf.csv');

if ((values.train && values.test) || values.split) {
  const [train, test] = values.split
    ? fixedSplit(openDataPath)
    : [openTlcKnowledge(resolve(values.train!)), openTlcKnowledge(resolve(values.test!), 1_000_000)];
  const smilesInTest = new Set(test.compounds.map((compound) => compound.smiles));
  const shared = new Set(
    train.compounds.filter((compound) => smilesInTest.has(compound.smiles)).map((compound) => compound.id),
  );
  const knowledge: KnowledgeSet = [...shared].reduce((set, id) => withoutCompound(set, id), train);
  console.log(
    `train ${values.train ?? 'fixed split (mod 4 ≠ 3)'}: ${knowledge.compounds.length} compounds ` +
      `(${shared.size} also in the test file left out); ` +
      `test ${values.test ?? 'fixed split (mod 4 = 3)'}: ${test.compounds.length} compounds`,
  );
  const fold = foldOf(knowledge);
  test.compounds.forEach((compound, index) => {
    scores.push(
      scoreCompound(
        fold,
        compound,
        test.measurements.filter((item) => item.compoundId === compound.id),
      ),
    );
    progress(index + 1, test.compounds.length);
  });
} else {
  const knowledge = values.tune ? fixedSplit(openDataPath)[0] : openTlcKnowledge(openDataPath);
  console.log(
    `leave-one-compound-out on ${values.tune ? 'the fixed split’s training part of ' : ''}tests/fixtures/open-tlc/tlc-rf.csv: ` +
      `${knowledge.compounds.length} compounds, ${knowledge.measurements.length} Rf values`,
  );
  knowledge.compounds.forEach((compound, index) => {
    scores.push(
      scoreCompound(
        foldOf(withoutCompound(knowledge, compound.id)),
        compound,
        knowledge.measurements.filter((item) => item.compoundId === compound.id),
      ),
    );
    progress(index + 1, knowledge.compounds.length);
  });
}
await closeFingerprintPool();

const summary = summarise(scores);
const f3 = (value: number) => value.toFixed(3);
console.log('Data: Xu et al., Chem 2022 (Apache-2.0), open TLC Rf on silica.');
console.log(`Rf values predicted: ${summary.measurements}`);
console.log(`Scout MAE (Rf):                      ${f3(summary.mae)}`);
console.log(
  `structure-blind baseline MAE (Rf):   ${f3(summary.baselineMae)}  (mean Rf per eluent over the training compounds)`,
);
console.log(`90 % interval coverage:              ${f3(summary.coverage)}`);
console.log(
  `hit rate (hexane/EtOAc ratio for Rf 0.3 gives ${hitWindow[0]}–${hitWindow[1]} on the compound's ` +
    `measured curve): ${f3(summary.hit)} of ${summary.hitCompounds} compounds with a curve`,
);
for (const [level, group] of Object.entries(summary.byConfidence))
  console.log(
    `  confidence ${level}: ${group.compounds} compounds, MAE ${Number.isNaN(group.mae) ? '–' : f3(group.mae)}`,
  );
if (!values.train && !values.split && !values.tune) {
  // Yardstick (tests/bench/transfer-ceiling.ts): the error left when the held-out compound's own Rf in one eluent is known.
  console.log(
    'yardstick — one measured plate of the held-out compound carried to the other eluents by lines over the other compounds:',
  );
  for (const row of transferCeilings(openTlcKnowledge(resolve('tests/fixtures/open-tlc/tlc-rf.csv')))) {
    console.log(`  known in ${row.reference.padEnd(44)} MAE ${f3(row.mae)}  hit ${f3(row.hit)} of ${row.hitCompounds}`);
  }
}
console.log(`time: ${((Date.now() - started) / 1000).toFixed(1)} s`);
console.log(`MAE=${summary.mae.toFixed(4)} hit=${summary.hit.toFixed(4)} coverage90=${summary.coverage.toFixed(4)}`);
