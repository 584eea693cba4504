/** SQL fragments the route-day reader and the week planner share. */

/** A stop's next due date, as the stops list computes it: last worked visit plus its cadence, else today. */
export const NEXT_DUE_SQL = (stop: string, today: string) =>
  `COALESCE((SELECT max(v.worked_on) FROM stop_visits v WHERE v.stop_id = ${stop}.id) + ${stop}.cadence_weeks * 7, ${today}::date)::text`;

/** An owner who sharpens: one with active stops assigned to them, or route days of their own. */
export const OWNER_SHARPENS = `(EXISTS (SELECT 1 FROM stops s WHERE s.assigned_sharpener_id = u.id AND s.active)
  OR EXISTS (SELECT 1 FROM route_days rd WHERE rd.sharpener_id = u.id))`;
