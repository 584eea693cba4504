/**
 * Cadence kept: each stop visit in the range ($1, $2; $3 one sharpener or null) against the stop's visit before it
 * (any time before, found through the stop's visit index). A visit is late when more days passed than the cadence
 * plus $4 grace days; a stop's first visit ever has nothing to be late against and counts as a visit only. Grouped
 * per stop and sharpener, and per sharpener alone (is_by_sharpener).
 */
export const CADENCE_SQL = `
  WITH v AS (
    SELECT sv.stop_id, sv.sharpener_id, sv.worked_on,
           sv.worked_on - (SELECT max(p.worked_on) FROM stop_visits p
                            WHERE p.stop_id = sv.stop_id AND p.worked_on < sv.worked_on) AS gap,
           s.cadence_weeks
      FROM stop_visits sv
      JOIN stops s ON s.id = sv.stop_id
     WHERE sv.worked_on BETWEEN $1::date AND $2::date
       AND ($3::uuid IS NULL OR sv.sharpener_id = $3::uuid)
  ),
  g AS (
    SELECT v.stop_id, v.sharpener_id, grouping(v.stop_id) = 1 AS is_by_sharpener,
           count(*) AS visits,
           count(*) FILTER (WHERE v.gap <= v.cadence_weeks * 7 + $4) AS on_time,
           count(*) FILTER (WHERE v.gap > v.cadence_weeks * 7 + $4) AS late,
           round(avg(v.gap), 1) AS average_gap_days,
           COALESCE(max(v.gap - v.cadence_weeks * 7) FILTER (WHERE v.gap > v.cadence_weeks * 7 + $4), 0)
             AS worst_late_days
      FROM v
     GROUP BY GROUPING SETS ((v.stop_id, v.sharpener_id), (v.sharpener_id))
  )
  SELECT g.stop_id, g.sharpener_id, g.is_by_sharpener, s.name AS stop_name, u.name AS sharpener_name,
         s.cadence_weeks, g.visits::float8 AS visits, g.on_time::float8 AS on_time, g.late::float8 AS late,
         g.average_gap_days::float8 AS average_gap_days, g.worst_late_days::float8 AS worst_late_days
    FROM g
    LEFT JOIN stops s ON s.id = g.stop_id
    LEFT JOIN users u ON u.id = g.sharpener_id
   ORDER BY g.is_by_sharpener, g.late DESC, s.name, u.name`;
