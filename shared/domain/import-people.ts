/** A member of the group as the import matches people against them. */
export interface Member {
  id: number;
  name: string;
  email: string;
}

const fold = (text: string) => text.normalize('NFKD').replace(/\p{M}/gu, '').toLowerCase();
const words = (text: string) =>
  fold(text)
    .split(/[^a-z0-9]+/)
    .filter(Boolean);

/** "Ada M. Lovelace" → "aml"; also "al" (first and last only), the forms initials are usually written in. */
function initialsOf(name: string): string[] {
  const list = words(name);
  if (list.length < 2) return [];
  const all = list.map((word) => word[0]).join('');
  const firstLast = list[0][0] + list[list.length - 1][0];
  return [...new Set([all, firstLast])];
}

/**
 * The member a sheet's person cell names: the full name (any case, accents, order "Lovelace, Ada"), the
 * e-mail or its local part, the initials ("AL", "A.L.", "aml"), or a first or last name that only one member
 * has. null when no member, or more than one, fits: the text is then kept as "recorded by".
 */
export function matchMember(cell: string, members: readonly Member[]): Member | null {
  const text = cell.trim();
  if (!text) return null;
  const key = words(text).sort().join(' ');
  const compact = fold(text).replace(/[^a-z0-9]/g, '');
  const single = (test: (member: Member) => boolean) => {
    const found = members.filter(test);
    return found.length === 1 ? found[0] : null;
  };
  return (
    single((member) => words(member.name).sort().join(' ') === key) ??
    single((member) => fold(member.email) === fold(text) || fold(member.email.split('@')[0]) === fold(text)) ??
    (compact.length >= 2 && compact.length <= 4 && !/\s/.test(text.replace(/\.\s*/g, '.'))
      ? single((member) => initialsOf(member.name).includes(compact))
      : null) ??
    (words(text).length === 1 ? single((member) => words(member.name).includes(words(text)[0])) : null)
  );
}
