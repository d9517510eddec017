import type { DuplicateGroup } from '../../../shared/schemas/curation';
import { presentCurationRecord } from './presenters';
import { groupSignature, type CurationRow } from './records';
import { hasDefinedStereo, namesOf, readStereo, structureScore } from './structures';
import { matchingPairs, pairOf } from './conditions-groups';

const nameOf = (row: CurationRow) => row.compoundName ?? row.canonicalSmiles;

/**
 * The same compound entered more than once: compound rows are unique by ID code (stereo as drawn), so two
 * entries of one substance show up as compounds whose structure without stereo is the same (readStereo),
 * typically one drawn with wedges and one without, under different names. Names alone never make a group:
 * the same name on different skeletons is a naming problem, not a duplicate. Each group holds every active
 * record of those compounds; merging across them is allowed (see curation-merge), choosing the compound.
 */
export function sameStructureGroups(rows: readonly CurationRow[]): DuplicateGroup[] {
  const byCompound = new Map<number, CurationRow[]>();
  for (const row of rows) byCompound.set(row.compoundId, [...(byCompound.get(row.compoundId) ?? []), row]);
  const families = new Map<string, number[]>();
  for (const [compoundId, records] of byCompound) {
    const skeleton = readStereo(records[0].idcode).skeleton;
    families.set(skeleton, [...(families.get(skeleton) ?? []), compoundId]);
  }
  const groups: DuplicateGroup[] = [];
  for (const compoundIds of families.values()) {
    if (compoundIds.length < 2) continue;
    compoundIds.sort((a, b) => a - b);
    const members = compoundIds.flatMap((id) => byCompound.get(id) ?? []).sort((a, b) => a.id - b.id);
    const entries = compoundIds.map((id) => {
      const first = (byCompound.get(id) as CurationRow[])[0];
      const stereo = readStereo(first.idcode);
      return {
        row: first,
        stereo,
        names: namesOf({ name: first.compoundName, synonyms: first.synonyms ?? [] }),
        count: (byCompound.get(id) as CurationRow[]).length,
      };
    });
    const shared = [...entries[0].names].filter((name) => entries.slice(1).some((entry) => entry.names.has(name)));
    const definedEntries = entries.filter((entry) => hasDefinedStereo(entry.stereo)).length;
    const pairs = matchingPairs(members, true).map(({ a, b, comparison }) => pairOf(a, b, comparison));
    const compoundWords = (row: (typeof entries)[number]['row']) =>
      `compound ${row.compoundId}, ${row.canonicalSmiles}`;
    const reasons = [
      `One structure entered as ${entries.length} compounds: ` +
        `${entries.map((entry) => `“${nameOf(entry.row)}” (${compoundWords(entry.row)})`).join(', ')}; ` +
        `without stereo their structures are identical.`,
      shared.length > 0
        ? `They share the name ${shared.map((name) => `“${name}”`).join(', ')}.`
        : 'Their names and synonyms differ.',
      definedEntries <= 1
        ? 'At most one entry draws its stereo; the others leave it open — likely the same substance drawn with and without wedges.'
        : `${definedEntries} entries draw defined stereo: they may be different stereoisomers (score lowered).`,
    ];
    if (pairs.length > 0) reasons.push(`${pairs.length} pair(s) of their records also meet the same-conditions rules.`);
    groups.push({
      kind: 'same-structure',
      signature: groupSignature(members),
      recordIds: members.map((row) => row.id),
      score: structureScore({ sharedName: shared.length > 0, definedEntries, conditionsMatch: pairs.length > 0 }),
      reasons,
      pairs,
      structures: entries.map((entry) => ({
        compoundId: entry.row.compoundId,
        name: entry.row.compoundName,
        synonyms: entry.row.synonyms ?? [],
        canonicalSmiles: entry.row.canonicalSmiles,
        stereoElements: entry.stereo.stereoElements,
        undefinedStereoElements: entry.stereo.undefinedElements,
        activeRecords: entry.count,
      })),
      records: members.map(presentCurationRecord),
    });
  }
  return groups;
}
