import { STOP_FIGURES_CTE } from './stops.sql';

/** How many of the stops that pay least for the drive the report shows. */
export const DRIVE_COST_STOPS = 10;

/**
 * The stops that earn least per route hour ($5: the fewest visits a stop needs), with the median over all stops and
 * each one's nearest active neighbour stop: great-circle distance (haversine, mean earth radius 6371 km) times the
 * planning settings' circuity, and the drive minutes that takes at their average speed (defaults when unset).
 */
export const DRIVE_COST_SQL = `
  WITH ${STOP_FIGURES_CTE},
  median AS (
    SELECT percentile_cont(0.5) WITHIN GROUP (ORDER BY per_route_hour_cents) AS cents FROM per_stop
  ),
  settings AS (
    SELECT COALESCE(max(circuity), 1.3)::float8 AS circuity, COALESCE(max(average_speed_kmh), 40)::float8 AS speed
      FROM planning_settings
  ),
  lowest AS (
    SELECT * FROM per_stop ORDER BY per_route_hour_cents, revenue_cents, stop_name LIMIT ${DRIVE_COST_STOPS}
  )
  SELECT l.*, round(m.cents)::float8 AS median_per_route_hour_cents,
         n.id AS neighbour_stop_id, n.name AS neighbour_name,
         round((n.km * st.circuity)::numeric, 1)::float8 AS neighbour_km,
         round((n.km * st.circuity / st.speed * 60)::numeric, 1)::float8 AS neighbour_drive_minutes
    FROM lowest l
   CROSS JOIN median m
   CROSS JOIN settings st
    LEFT JOIN LATERAL (
      SELECT o.id, o.name,
             2 * 6371 * asin(sqrt(
               power(sin(radians(o.latitude - l.latitude) / 2), 2)
               + cos(radians(l.latitude)) * cos(radians(o.latitude)) * power(sin(radians(o.longitude - l.longitude) / 2), 2)
             )) AS km
        FROM stops o
       WHERE o.active AND o.id <> l.stop_id AND o.latitude IS NOT NULL AND l.latitude IS NOT NULL
       ORDER BY km
       LIMIT 1
    ) n ON true
   ORDER BY l.per_route_hour_cents, l.revenue_cents, l.stop_name`;
