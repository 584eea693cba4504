import { FACT_SUMS, WORK_FACTS } from './work-facts';

/**
 * The trend by month: every month of the range (months with no work included), the work done ($5: one stop or null)
 * and, for the whole business, what was invoiced and collected. $6 is the business time zone: payments and credit
 * notes are timestamps, and a month is a month where the business is.
 *
 * Invoiced: issued invoices (never void) by issue date, less credit notes by the day they were written. Collected:
 * every payment received (on site and on invoices), less refunds paid out on credit notes.
 */
export const MONTHS_SQL = `
  WITH ${WORK_FACTS},
  months AS (
    SELECT generate_series(date_trunc('month', $1::date), date_trunc('month', $2::date), interval '1 month')::date
             AS month
  ),
  work AS (
    SELECT date_trunc('month', f.day)::date AS month, ${FACT_SUMS}
      FROM facts f
     WHERE $5::uuid IS NULL OR f.stop_id = $5::uuid
     GROUP BY 1
  ),
  bounds AS (
    SELECT $1::date::timestamp AT TIME ZONE $6 AS starts, ($2::date + 1)::timestamp AT TIME ZONE $6 AS ends
  ),
  issued AS (
    SELECT date_trunc('month', i.issue_date)::date AS month, sum(i.total_cents) AS cents
      FROM invoices i
     WHERE i.status NOT IN ('draft', 'void') AND i.issue_date BETWEEN $1::date AND $2::date
     GROUP BY 1
  ),
  credited AS (
    SELECT date_trunc('month', c.created_at AT TIME ZONE $6)::date AS month, sum(c.amount_cents) AS cents,
           COALESCE(sum(c.amount_cents) FILTER (WHERE c.refund_method <> 'none'), 0) AS refunded
      FROM credit_notes c
      JOIN invoices i ON i.id = c.invoice_id AND i.status <> 'void', bounds b
     WHERE c.created_at >= b.starts AND c.created_at < b.ends
     GROUP BY 1
  ),
  received AS (
    SELECT date_trunc('month', p.recorded_at AT TIME ZONE $6)::date AS month, sum(p.amount_cents) AS cents
      FROM payments p, bounds b
     WHERE p.recorded_at >= b.starts AND p.recorded_at < b.ends
     GROUP BY 1
  )
  SELECT to_char(m.month, 'YYYY-MM') AS month,
         COALESCE(w.visits, 0)::float8 AS visits,
         COALESCE(w.tickets, 0)::float8 AS tickets,
         COALESCE(w.shears, 0)::float8 AS shears,
         COALESCE(w.revenue_cents, 0)::float8 AS revenue_cents,
         round(w.revenue_cents::numeric / NULLIF(w.visits, 0))::float8 AS per_visit_cents,
         (COALESCE(i.cents, 0) - COALESCE(c.cents, 0))::float8 AS invoiced_cents,
         (COALESCE(r.cents, 0) - COALESCE(c.refunded, 0))::float8 AS collected_cents
    FROM months m
    LEFT JOIN work w ON w.month = m.month
    LEFT JOIN issued i ON i.month = m.month
    LEFT JOIN credited c ON c.month = m.month
    LEFT JOIN received r ON r.month = m.month
   ORDER BY m.month`;
