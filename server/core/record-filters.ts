import type { RecordListQueryParsed } from '../../shared/schemas/record';

/**
 * SQL conditions for the record list filters, over `condition_records r`, `compounds c` and `users u`.
 * Values always travel as replacements, never inside the SQL text.
 */
export function recordFilterSql(query: Omit<RecordListQueryParsed, 'page' | 'pageSize' | 'sort' | 'order'>) {
  const conditions: string[] = [];
  const replacements: Record<string, unknown> = {};
  if (query.status !== 'all') {
    conditions.push('r.status = :status');
    replacements.status = query.status;
  }
  if (query.q) {
    conditions.push(`(
      c.name ILIKE :q OR array_to_string(c.synonyms, ' ') ILIKE :q OR c.canonical_smiles = :qExact OR upper(c.formula) = upper(:qExact)
      OR r.notes ILIKE :q OR r.notebook_ref ILIKE :q OR r.outcome_reason ILIKE :q OR r.purity_note ILIKE :q
    )`);
    replacements.q = `%${query.q.replace(/[\\%_]/g, (char) => `\\${char}`)}%`;
    replacements.qExact = query.q;
  }
  if (query.compoundId) {
    conditions.push('r.compound_id = :compoundId');
    replacements.compoundId = query.compoundId;
  }
  if (query.class) {
    conditions.push(':className = ANY(c.classes)');
    replacements.className = query.class;
  }
  if (query.phase?.length) {
    conditions.push('r.stationary_phase IN (:phases)');
    replacements.phases = query.phase;
  }
  if (query.solvent?.length) {
    conditions.push('r.solvent_keys @> CAST(ARRAY[:solvents] AS text[])');
    replacements.solvents = query.solvent;
  }
  if (query.stain?.length) {
    conditions.push(
      'EXISTS (SELECT 1 FROM record_visualisations v WHERE v.record_id = r.id AND v.method IN (:stains))',
    );
    replacements.stains = query.stain;
  }
  if (query.outcome?.length) {
    conditions.push('r.outcome IN (:outcomes)');
    replacements.outcomes = query.outcome;
  }
  if (query.technique?.length) {
    conditions.push('r.technique IN (:techniques)');
    replacements.techniques = query.technique;
  }
  if (query.author) {
    conditions.push(
      '(r.author_id = :author OR EXISTS (SELECT 1 FROM record_contributors rc WHERE rc.record_id = r.id AND rc.user_id = :author))',
    );
    replacements.author = query.author;
  }
  if (query.demo !== undefined) {
    conditions.push('r.demo = :demo');
    replacements.demo = query.demo;
  }
  if (query.from) {
    conditions.push('r.created_at >= CAST(:from AS date)');
    replacements.from = query.from;
  }
  if (query.to) {
    conditions.push("r.created_at < (CAST(:to AS date) + interval '1 day')");
    replacements.to = query.to;
  }
  return { where: conditions.length > 0 ? conditions.join(' AND ') : 'TRUE', replacements };
}
