import { FACT_SUMS, FIGURES, WORK_FACTS } from './work-facts';

/** Revenue per sharpener and the totals row; work nobody is recorded against comes as a row with no sharpener. */
export const SHARPENERS_SQL = `
  WITH ${WORK_FACTS},
  grouped AS (
    SELECT f.sharpener_id, grouping(f.sharpener_id) = 1 AS is_total,
           count(DISTINCT f.route_day_id) AS route_days, ${FACT_SUMS}
      FROM facts f
     GROUP BY GROUPING SETS ((f.sharpener_id), ())
  )
  SELECT g.sharpener_id, g.is_total, u.name AS sharpener_name, g.route_days::float8 AS route_days, ${FIGURES}
    FROM grouped g
    LEFT JOIN users u ON u.id = g.sharpener_id
   ORDER BY g.is_total, g.revenue_cents DESC, u.name`;
