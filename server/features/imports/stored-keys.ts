import { QueryTypes, type Transaction } from 'sequelize';
import { sequelize } from '../../db/sequelize';

/**
 * Content hashes already stored, ignoring records of undone imports (undoing an import and importing the
 * file again brings its rows back). See recordContentHash for what counts as the same record.
 */
export async function storedHashes(hashes: readonly string[], transaction?: Transaction): Promise<Set<string>> {
  if (hashes.length === 0) return new Set();
  const rows = await sequelize.query<{ hash: string }>(
    `SELECT DISTINCT r.content_hash AS hash FROM condition_records r
     WHERE r.content_hash IN (:hashes)
       AND NOT EXISTS (SELECT 1 FROM imports i WHERE i.id = r.import_id AND i.status = 'undone')`,
    { replacements: { hashes: [...hashes] }, type: QueryTypes.SELECT, transaction },
  );
  return new Set(rows.map((row) => row.hash));
}

/** Stored compounds' ids by ID code, for the ID codes given. */
export async function storedCompoundIds(
  idcodes: readonly string[],
  transaction?: Transaction,
): Promise<Map<string, number>> {
  if (idcodes.length === 0) return new Map();
  const rows = await sequelize.query<{ id: number; idcode: string }>(
    'SELECT id, idcode FROM compounds WHERE idcode IN (:idcodes)',
    {
      replacements: { idcodes: [...idcodes] },
      type: QueryTypes.SELECT,
      transaction,
    },
  );
  return new Map(rows.map((row) => [row.idcode, row.id]));
}

/**
 * The compound of each stored record among the ids given (an export of this app carries its record ids), ignoring
 * records of undone imports: a re-imported export row whose record id names a record of the same compound is that record.
 */
export async function storedRecordCompounds(
  ids: readonly number[],
  transaction?: Transaction,
): Promise<Map<number, number>> {
  if (ids.length === 0) return new Map();
  const rows = await sequelize.query<{ id: number; compoundId: number }>(
    `SELECT r.id, r.compound_id AS "compoundId" FROM condition_records r
     WHERE r.id IN (:ids) AND NOT EXISTS (SELECT 1 FROM imports i WHERE i.id = r.import_id AND i.status = 'undone')`,
    { replacements: { ids: [...new Set(ids)] }, type: QueryTypes.SELECT, transaction },
  );
  return new Map(rows.map((row) => [row.id, row.compoundId]));
}
