// INVENTED DEMO DATA. The compounds are real, common laboratory compounds; every condition record, Rf,
// ratio, yield, note and person here is invented for the demo (see seeders/demo-rf-model.ts for how the
// Rf values are made plausible). None of it is a measurement; do not use it at the bench.
import type { Transaction } from 'sequelize';
import { User } from '../server/db/models';
import { findOrCreateCompounds } from '../server/core/compounds';
import { insertRecord } from '../server/core/record-rows';
import { demoCompounds } from './demo-compounds';
import { planDemoRecords } from './demo-plan';

const initialsOf = (name: string) =>
  name
    .replace(/\(demo\)/, '')
    .split(/[\s-]+/)
    .filter(Boolean)
    .map((part) => part[0].toUpperCase())
    .join('')
    .slice(0, 3);

/**
 * Seeds the invented group's records (flagged `demo`) over the demo compounds. Compounds and their
 * fingerprints are made in one batch through the worker pool; records are written one by one with
 * their revision, inside the caller's transaction. Returns how many records were written.
 */
export async function seedDemoRecords(authorIds: number[], transaction: Transaction): Promise<number> {
  const compounds = await findOrCreateCompounds(
    demoCompounds.map((compound) => ({ structure: compound.smiles, name: compound.name })),
    {
      userId: authorIds[0] ?? null,
      transaction,
    },
  );
  const authors = await User.findAll({ where: { id: authorIds }, transaction });
  const initials = new Map(authors.map((author) => [author.id, initialsOf(author.name)]));
  const plan = planDemoRecords(
    demoCompounds.map((compound, index) => ({ ...compound, classes: compounds[index].classes })),
    authorIds.length,
  );
  const pages = new Map<number, number>();
  for (const item of plan.sort((a, b) => a.createdAt.getTime() - b.createdAt.getTime())) {
    const authorId = authorIds[item.author];
    const page = (pages.get(authorId) ?? 10) + 1;
    pages.set(authorId, page);
    const notebookRef = `${initials.get(authorId) ?? 'X'}-${String(1 + Math.floor(page / 150)).padStart(2, '0')} p. ${page % 150}`;
    await insertRecord(
      { ...item.content, notebookRef, compoundId: compounds[item.compound].id },
      { authorId, transaction, demo: true, createdAt: item.createdAt },
    );
  }
  return plan.length;
}
