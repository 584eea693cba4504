import { FIGURES, STOP_TIME, WORKED } from './work-facts';

/**
 * Revenue per route day, newest first: the day's stops and its time from `stop_time`, its money from the tickets
 * worked on it. Only days with at least one stop; `visits` counts the stops where a ticket was worked. Without
 * `facts`, each of `worked` and `stop_time` is read once and PostgreSQL plans it into the query.
 */
export const ROUTE_DAYS_SQL = `
  WITH ${WORKED},
  ${STOP_TIME},
  time AS (
    SELECT route_day_id, count(*) AS stops, sum(bench_minutes) AS bench_minutes,
           sum(drive_minutes) AS drive_minutes, sum(km) AS km
      FROM stop_time
     GROUP BY route_day_id
  ),
  money AS (
    SELECT route_day_id, count(*) AS tickets, count(DISTINCT stop_id) AS visits, sum(shears) AS shears,
           sum(subtotal_cents) AS revenue_cents
      FROM worked
     WHERE route_day_id IS NOT NULL
     GROUP BY route_day_id
  ),
  g AS (
    SELECT rd.id AS route_day_id, rd.day, rd.sharpener_id, tm.stops,
           COALESCE(m.visits, 0) AS visits, COALESCE(m.tickets, 0) AS tickets, COALESCE(m.shears, 0) AS shears,
           COALESCE(m.revenue_cents, 0) AS revenue_cents, tm.bench_minutes, tm.drive_minutes, tm.km
      FROM route_days rd
      JOIN time tm ON tm.route_day_id = rd.id
      LEFT JOIN money m ON m.route_day_id = rd.id
  )
  SELECT g.route_day_id, g.day::text AS day, g.sharpener_id, u.name AS sharpener_name, g.stops::float8 AS stops,
         ${FIGURES}
    FROM g
    JOIN users u ON u.id = g.sharpener_id
   ORDER BY g.day DESC, u.name`;
