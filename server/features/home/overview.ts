import { QueryTypes } from 'sequelize';
import { sequelize } from '../../db/sequelize';
import type { Overview } from '../../../shared/schemas/overview';

interface Row {
  month_start: Date;
  records: string;
  records_month: string;
  compounds: string;
  compounds_month: string;
  contributors: string;
  contributors_month: string;
  classes: string;
  classes_month: string;
  demo_records: string;
}

/** Counts of the base (active records, their compounds, authors and classes), in total and new since the month began. */
export async function overview(): Promise<Overview> {
  const [row] = await sequelize.query<Row>(
    `WITH month AS (SELECT date_trunc('month', now() AT TIME ZONE 'UTC') AT TIME ZONE 'UTC' AS start),
     active AS (SELECT r.id, r.compound_id, r.author_id, r.created_at, r.demo FROM condition_records r WHERE r.status = 'active'),
     first_by_compound AS (SELECT compound_id, min(created_at) AS first FROM active GROUP BY compound_id),
     first_by_author AS (SELECT author_id, min(created_at) AS first FROM active GROUP BY author_id),
     first_by_class AS (
       SELECT cls, min(a.created_at) AS first FROM active a JOIN compounds c ON c.id = a.compound_id CROSS
         JOIN LATERAL unnest(c.classes) AS cls GROUP BY cls
     )
     SELECT (SELECT start FROM month) AS month_start,
       (SELECT count(*) FROM active) AS records,
       (SELECT count(*) FROM active, month WHERE created_at >= month.start) AS records_month,
       (SELECT count(*) FROM first_by_compound) AS compounds,
       (SELECT count(*) FROM first_by_compound, month WHERE first >= month.start) AS compounds_month,
       (SELECT count(*) FROM first_by_author) AS contributors,
       (SELECT count(*) FROM first_by_author, month WHERE first >= month.start) AS contributors_month,
       (SELECT count(*) FROM first_by_class) AS classes,
       (SELECT count(*) FROM first_by_class, month WHERE first >= month.start) AS classes_month,
       (SELECT count(*) FROM active WHERE demo) AS demo_records`,
    { type: QueryTypes.SELECT },
  );
  const growth = (total: string, thisMonth: string) => ({ total: Number(total), thisMonth: Number(thisMonth) });
  return {
    monthStart: new Date(row.month_start).toISOString(),
    records: growth(row.records, row.records_month),
    compounds: growth(row.compounds, row.compounds_month),
    contributors: growth(row.contributors, row.contributors_month),
    classes: growth(row.classes, row.classes_month),
    demoRecords: Number(row.demo_records),
  };
}
