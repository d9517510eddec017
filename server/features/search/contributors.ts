import { QueryTypes } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import type { SearchContributors } from '../../../shared/schemas/search';

/** People credited on active records (as author or contributor), with how many records each, by name. */
export async function searchContributors(): Promise<SearchContributors> {
  const rows = await sequelize.query<{ id: number; name: string; records: string }>(
    `SELECT u.id, u.name, count(DISTINCT r.id) AS records
     FROM condition_records r JOIN record_contributors rc ON rc.record_id = r.id JOIN users u ON u.id = rc.user_id
     WHERE r.status = 'active' GROUP BY u.id, u.name ORDER BY lower(u.name), u.id`,
    { type: QueryTypes.SELECT },
  );
  return { items: rows.map((row) => ({ id: row.id, name: row.name, records: Number(row.records) })) };
}
