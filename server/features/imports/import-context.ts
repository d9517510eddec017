import { decideDateOrder, type DateColumnOrder, type DateOrder } from '../../../shared/domain/import-dates';
import type { Member } from '../../../shared/domain/import-people';
import { User } from '../../db/models';
import type { RowContext } from './row-facts';
import type { ImportSource } from './source';

/** The group's members (active or not: old sheets name people who left), for matching a sheet's people. */
async function loadMembers(): Promise<Member[]> {
  const users = await User.findAll({ attributes: ['id', 'name', 'email'] });
  return users.map((user) => ({ id: user.id, name: user.name, email: user.email }));
}

/** The date column's day/month order, decided from every cell of the column (the user's choice wins). */
export async function dateColumnOrder(
  source: ImportSource,
  mapping: Record<string, string>,
  chosen?: DateOrder | null,
): Promise<DateColumnOrder & { column: string | null }> {
  const column = Object.keys(mapping).find((header) => mapping[header] === 'date') ?? null;
  const cells: string[] = [];
  if (column) for await (const row of source.rows()) cells.push(row.values[column] ?? '');
  const decided = decideDateOrder(cells);
  if (chosen) return { ...decided, column, order: chosen, needsChoice: false };
  return { ...decided, column };
}

export async function rowContext(order: DateOrder | null): Promise<RowContext> {
  return { dateOrder: order, members: await loadMembers() };
}
