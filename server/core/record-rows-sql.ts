import type { Model, ModelStatic } from 'sequelize';
import { Compound, ConditionRecord, RecordSpot, RecordVisualisation } from '../db/models';

/**
 * SQL pieces that read records as plain rows in one round trip, for the hot lists (records table, record
 * page, search results, bookmarks, class pages, exports). Column lists come from the models, so a column
 * added to a model is read here too; values keep the types the pg driver gives Sequelize.
 */
type AnyModel = ModelStatic<Model>;

const columnOf = (model: AnyModel, attribute: string) => model.getAttributes()[attribute].field ?? attribute;
const attributesOf = (model: AnyModel, exclude: readonly string[] = []) =>
  Object.keys(model.getAttributes()).filter((name) => !exclude.includes(name));

/** `alias."column" AS "prefix.attribute"` for every attribute of the model. */
export function selectColumns(model: AnyModel, alias: string, prefix = '', exclude: readonly string[] = []): string {
  return attributesOf(model, exclude)
    .map((name) => `${alias}."${columnOf(model, name)}" AS "${prefix}${name}"`)
    .join(', ');
}

/** A JSON array of the model's rows for one record, ordered like the editor shows them (only JSON-safe column types). */
function childArray(model: AnyModel, table: string): string {
  const pairs = attributesOf(model)
    .map((name) => `'${name}', x."${columnOf(model, name)}"`)
    .join(', ');
  return (
    `coalesce((SELECT json_agg(json_build_object(${pairs}) ORDER BY x.position, x.id) FROM ${table} ` +
    `x WHERE x.record_id = r.id), '[]'::json)`
  );
}

/**
 * Everything a list row shows, one row per record: the record, its compound (without fingerprint, and
 * without molfile unless asked: exports need it, pages do not), author, spots, stains, photo count.
 */
export const listRowsSql = (withMolfile: boolean) => `SELECT ${selectColumns(ConditionRecord, 'r')},
  ${selectColumns(Compound, 'c', 'compound.', withMolfile ? ['fingerprint'] : ['fingerprint', 'molfile'])},
  u.id AS "author.id", u.name AS "author.name",
  ${childArray(RecordSpot, 'record_spots')} AS spots,
  ${childArray(RecordVisualisation, 'record_visualisations')} AS visualisations,
  (SELECT count(*)::int FROM record_photos p WHERE p.record_id = r.id AND p.removed_at IS NULL) AS "photoCount"
FROM condition_records r JOIN compounds c ON c.id = r.compound_id JOIN users u ON u.id = r.author_id
WHERE r.id IN (:ids)`;

const splitKeys = new Map<string, readonly [string, string] | null>();
const splitKey = (key: string) => {
  let split = splitKeys.get(key);
  if (split === undefined) {
    const dot = key.indexOf('.');
    split = dot < 0 ? null : ([key.slice(0, dot), key.slice(dot + 1)] as const);
    splitKeys.set(key, split);
  }
  return split;
};

/** Splits `prefix.attribute` keys into nested objects: { "compound.name": x } → { compound: { name: x } }. */
export function nest(row: Record<string, unknown>): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const key in row) {
    const split = splitKey(key);
    if (!split) out[key] = row[key];
    else ((out[split[0]] ??= {}) as Record<string, unknown>)[split[1]] = row[key];
  }
  return out;
}
