import { WORKED } from './work-facts';

export type LineGrouping = 'edge_type' | 'tool_kind';

/**
 * The shear lines of the worked tickets grouped by the shear's edge type or tool kind, at the price the line was
 * charged (the override where there is one). Trip charges and other ticket-level amounts are not shear lines, so
 * these add up to less than the stops report's revenue. `share_bp`: the group's part of all lines' revenue.
 * Only `worked` is taken from the common start, so PostgreSQL plans it into the join instead of materialising it.
 * Parameters: $1 from, $2 to, $3 sharpener id or null.
 */
export function shearLinesSql(by: LineGrouping): string {
  return `
  WITH ${WORKED},
  g AS (
    SELECT sh.${by} AS key, count(*) AS lines, sum(COALESCE(l.override_cents, l.price_cents)) AS revenue_cents
      FROM worked w
      JOIN ticket_lines l ON l.ticket_id = w.id
      JOIN shears sh ON sh.id = l.shear_id
     GROUP BY sh.${by}
  )
  SELECT g.key, g.lines::float8 AS lines, g.revenue_cents::float8 AS revenue_cents,
         round(g.revenue_cents::numeric / NULLIF(g.lines, 0))::float8 AS average_cents,
         COALESCE(round(g.revenue_cents::numeric * 10000 / NULLIF(sum(g.revenue_cents) OVER (), 0)), 0)::float8 AS share_bp
    FROM g
   ORDER BY g.revenue_cents DESC, g.key`;
}
