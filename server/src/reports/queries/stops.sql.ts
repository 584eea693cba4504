import { FACT_SUMS, FIGURES, WORK_FACTS } from './work-facts';

/** Revenue per stop, and the totals row (stop_id null, is_total true), biggest earners first. */
export const STOPS_SQL = `
  WITH ${WORK_FACTS},
  grouped AS (
    SELECT f.stop_id, grouping(f.stop_id) = 1 AS is_total, ${FACT_SUMS}
      FROM facts f
     WHERE f.stop_id IS NOT NULL
     GROUP BY GROUPING SETS ((f.stop_id), ())
  )
  SELECT g.stop_id, g.is_total, s.name AS stop_name, s.city, s.cadence_weeks, ${FIGURES}
    FROM grouped g
    LEFT JOIN stops s ON s.id = g.stop_id
   ORDER BY g.is_total, g.revenue_cents DESC, s.name`;

/** One stop's figures per stop, for the drive-cost report: $5 the fewest visits a stop needs to be judged. */
export const STOP_FIGURES_CTE = `
  ${WORK_FACTS},
  grouped AS (
    SELECT f.stop_id, ${FACT_SUMS}
      FROM facts f
     WHERE f.stop_id IS NOT NULL
     GROUP BY f.stop_id
  ),
  per_stop AS (
    SELECT g.stop_id, s.name AS stop_name, s.city, s.cadence_weeks, s.latitude, s.longitude, ${FIGURES}
      FROM grouped g
      JOIN stops s ON s.id = g.stop_id
     WHERE g.visits >= $5 AND g.bench_minutes + g.drive_minutes > 0
  )`;
