import type { ReceivablesGroup } from '../dto/report-query.dto';

/** The ageing buckets, in days past the due date, as the report's columns (common practice: 30-day bands). */
export const AGEING_BUCKETS = [
  { column: 'current_cents', label: 'Current', when: 'days_late <= 0' },
  { column: 'days_1_to_30_cents', label: '1-30 days', when: 'days_late BETWEEN 1 AND 30' },
  { column: 'days_31_to_60_cents', label: '31-60 days', when: 'days_late BETWEEN 31 AND 60' },
  { column: 'days_61_to_90_cents', label: '61-90 days', when: 'days_late BETWEEN 61 AND 90' },
  { column: 'over_90_cents', label: 'Over 90 days', when: 'days_late > 90' },
] as const;

const PARTY: Record<ReceivablesGroup, { key: string; name: string; stopName: string }> = {
  // The bill-to party: the customer, or the stop when the stop pays as a whole.
  customer: {
    key: `CASE WHEN o.bill_to = 'stop' THEN 'stop:' || o.stop_id ELSE 'customer:' || o.customer_id END`,
    name: `CASE WHEN o.bill_to = 'stop' THEN s.name ELSE cu.name END`,
    stopName: `CASE WHEN o.bill_to = 'stop' THEN NULL ELSE s.name END`,
  },
  stop: { key: `COALESCE(s.id::text, 'none')`, name: `COALESCE(s.name, 'No stop')`, stopName: 'NULL' },
};

/**
 * Receivables ageing as of $1 (a date; $2 the business time zone): every issued invoice that is not void, with what
 * was still owed on it at the end of that day (its total less the payments and credit notes dated up to then), put in
 * the band of how many days past due it was. Only invoices with something owed; the totals row has key null.
 *
 * Which invoices can owe anything on that day: the ones open now, and the ones settled by a payment or credit note
 * dated after it. The rest were fully settled by then, so the query never reads their payments.
 */
export function receivablesSql(groupBy: ReceivablesGroup): string {
  const party = PARTY[groupBy];
  const buckets = AGEING_BUCKETS.map(
    (b) => `COALESCE(sum(balance_cents) FILTER (WHERE ${b.when}), 0)::float8 AS ${b.column}`,
  ).join(',\n         ');
  return `
  WITH bounds AS (SELECT ($1::date + 1)::timestamp AT TIME ZONE $2 AS ends),
  candidates AS (
    SELECT i.* FROM invoices i
     WHERE i.status IN ('sent', 'part-paid', 'paid') AND i.issue_date <= $1::date
       AND (i.status IN ('sent', 'part-paid')
            OR i.id IN (SELECT p.invoice_id FROM payments p, bounds b WHERE p.recorded_at >= b.ends)
            OR i.id IN (SELECT c.invoice_id FROM credit_notes c, bounds b WHERE c.created_at >= b.ends))
  ),
  owed AS (
    SELECT o.*, $1::date - o.due_date AS days_late,
           o.total_cents
             - COALESCE((SELECT sum(p.amount_cents) FROM payments p, bounds b
                          WHERE p.invoice_id = o.id AND p.recorded_at < b.ends), 0)
             - COALESCE((SELECT sum(c.amount_cents) FROM credit_notes c, bounds b
                          WHERE c.invoice_id = o.id AND c.created_at < b.ends), 0) AS balance_cents
      FROM candidates o
  ),
  parties AS (
    SELECT ${party.key} AS key, ${party.name} AS name, ${party.stopName} AS stop_name, o.balance_cents, o.days_late
      FROM owed o
      LEFT JOIN customers cu ON cu.id = o.customer_id
      LEFT JOIN stops s ON s.id = COALESCE(o.stop_id, cu.stop_id)
     WHERE o.balance_cents > 0
  )
  SELECT key, grouping(key) = 1 AS is_total, min(name) AS name, min(stop_name) AS stop_name,
         count(*)::float8 AS invoices,
         ${buckets},
         COALESCE(sum(balance_cents), 0)::float8 AS total_cents
    FROM parties
   GROUP BY GROUPING SETS ((key), ())
   ORDER BY is_total, total_cents DESC, name`;
}
