/**
 * The common start of the revenue reports, as SQL common table expressions. Parameters: $1 from, $2 to (dates,
 * inclusive), $3 sharpener id or null, $4 the last route day that counts (the earlier of `to` and today).
 *
 * - `worked`: tickets finished or handed back with a visit day in the range; revenue is the ticket's subtotal (the
 *   work's price before tax, after overrides, with any trip charge). A ticket belongs to the sharpener of its route day,
 *   or, off any route day, to whoever opened it.
 * - `stop_time`: each stop on each route day in the range with its bench time and its share of the day's drive. The
 *   day's drive time and distance (including the way home) are split over its stops in proportion to the leg that led
 *   to each; a day whose legs are all zero splits evenly. docs/reports.md explains the rule.
 * - `facts`: both, one row per ticket or stop-day, so a report can add them up in one GROUP BY. A visit is a stop on a
 *   day with a route-day stop or a worked ticket other than a drop-off.
 */
export const WORKED = `
  worked AS (
    SELECT t.id, t.stop_id, t.visit_day, t.kind, t.subtotal_cents, t.route_day_id,
           COALESCE(rd.sharpener_id, t.opened_by) AS sharpener_id,
           t.shear_count AS shears
      FROM tickets t
      LEFT JOIN route_days rd ON rd.id = t.route_day_id
     WHERE t.status IN ('finished', 'handed-back')
       AND t.visit_day BETWEEN $1::date AND $2::date
       AND ($3::uuid IS NULL OR COALESCE(rd.sharpener_id, t.opened_by) = $3::uuid)
  )`;

export const STOP_TIME = `
  stop_time AS (
    SELECT rds.stop_id, rds.route_day_id, rd.day, rd.sharpener_id, rds.bench_minutes,
           CASE WHEN sum(rds.drive_minutes_before) OVER day > 0
                THEN rd.drive_minutes * rds.drive_minutes_before::numeric / sum(rds.drive_minutes_before) OVER day
                ELSE rd.drive_minutes::numeric / count(*) OVER day END AS drive_minutes,
           CASE WHEN sum(rds.km_before) OVER day > 0
                THEN rd.distance_km::numeric * rds.km_before::numeric / sum(rds.km_before::numeric) OVER day
                ELSE rd.distance_km::numeric / count(*) OVER day END AS km
      FROM route_days rd
      JOIN route_day_stops rds ON rds.route_day_id = rd.id
     WHERE rd.day BETWEEN $1::date AND $4::date
       AND ($3::uuid IS NULL OR rd.sharpener_id = $3::uuid)
    WINDOW day AS (PARTITION BY rds.route_day_id)
  )`;

/** `worked`, `stop_time` and `facts` on top of both (the reports over visits and route time). */
export const WORK_FACTS = `
  ${WORKED},
  ${STOP_TIME},
  facts AS (
    SELECT stop_id, sharpener_id, visit_day AS day, route_day_id AS ticket_route_day_id, NULL::uuid AS route_day_id,
           stop_id IS NOT NULL AND kind <> 'drop-off' AS is_visit, 1 AS tickets, subtotal_cents AS revenue_cents, shears,
           0::numeric AS bench_minutes, 0::numeric AS drive_minutes, 0::numeric AS km
      FROM worked
    UNION ALL
    SELECT stop_id, sharpener_id, day, NULL::uuid, route_day_id,
           true, 0, 0, 0, bench_minutes, drive_minutes, km
      FROM stop_time
  )`;

/** The figures every revenue row shares, added up over a group of `facts` rows aliased f. */
export const FACT_SUMS = `
  count(DISTINCT f.stop_id::text || ' ' || f.day) FILTER (WHERE f.is_visit) AS visits,
  COALESCE(sum(f.tickets), 0) AS tickets,
  COALESCE(sum(f.shears), 0) AS shears,
  COALESCE(sum(f.revenue_cents), 0) AS revenue_cents,
  COALESCE(sum(f.bench_minutes), 0) AS bench_minutes,
  COALESCE(sum(f.drive_minutes), 0) AS drive_minutes,
  COALESCE(sum(f.km), 0) AS km`;

/**
 * The figures as the answer gives them, from columns named as in FACT_SUMS on alias g. Every figure is cast to
 * float8 so pg hands JavaScript a number (bigint and numeric arrive as strings); cents stay whole, well below 2^53.
 * Ratios are null where their denominator is zero and rounded to whole cents (half away from zero).
 */
export const FIGURES = `
  g.visits::float8 AS visits,
  g.tickets::float8 AS tickets,
  g.shears::float8 AS shears,
  g.revenue_cents::float8 AS revenue_cents,
  g.bench_minutes::float8 AS bench_minutes,
  round(g.drive_minutes, 1)::float8 AS drive_minutes,
  round(g.bench_minutes + g.drive_minutes, 1)::float8 AS route_minutes,
  round(g.km, 1)::float8 AS km,
  round(g.revenue_cents::numeric / NULLIF(g.visits, 0))::float8 AS per_visit_cents,
  round(g.revenue_cents::numeric * 60 / NULLIF(g.bench_minutes, 0))::float8 AS per_bench_hour_cents,
  round(g.revenue_cents::numeric * 60 / NULLIF(g.bench_minutes + g.drive_minutes, 0))::float8 AS per_route_hour_cents,
  round(g.revenue_cents::numeric / NULLIF(g.km, 0))::float8 AS per_km_cents,
  round(g.shears::numeric / NULLIF(g.visits, 0), 2)::float8 AS shears_per_visit`;
