import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { benchMinutes, type BenchPair, type EdgeType, type ToolKind } from '@keenroute/shared';
import type { DataSource } from 'typeorm';

export interface ExpectedBench {
  pairs: number;
  minutes: number;
}

interface ShearGroup {
  stop_id: string;
  edge_type: EdgeType;
  tool_kind: ToolKind;
  count: number;
}

/** How many past visits the turnout estimate looks back over. */
const VISITS_LOOKED_AT = 3;

/**
 * Bench minutes expected at a stop visit, from the rules package's bench time: the setup plus the stop's in-service
 * shears by edge type and tool kind (inside-edge honing is decided at the bench, so not counted ahead), scaled to the
 * pairs serviced on average at its last three worked visits when it has any (not every registered shear comes in
 * every time). Booked drop-offs will refine this when bookings exist.
 */
@Injectable()
export class ExpectedBenchService {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  async forStops(stopIds: readonly string[]): Promise<Map<string, ExpectedBench>> {
    const result = new Map<string, ExpectedBench>();
    if (stopIds.length === 0) return result;
    const groups = await this.dataSource.query<ShearGroup[]>(
      `SELECT c.stop_id, s.edge_type, s.tool_kind, count(*)::int AS count
         FROM shears s JOIN customers c ON c.id = s.customer_id
        WHERE c.stop_id = ANY($1) AND c.active AND s.status = 'in-service'
        GROUP BY 1, 2, 3`,
      [stopIds],
    );
    const pairsByStop = new Map<string, BenchPair[]>();
    for (const group of groups) {
      const pairs = pairsByStop.get(group.stop_id) ?? [];
      pairs.push({
        edgeType: group.edge_type,
        toolKind: group.tool_kind,
        count: group.count,
      });
      pairsByStop.set(group.stop_id, pairs);
    }
    const turnout = await this.averagePairsServiced(stopIds);
    for (const id of stopIds) {
      const pairs = pairsByStop.get(id) ?? [];
      const registered = pairs.reduce((sum, pair) => sum + (pair.count ?? 1), 0);
      const setup = benchMinutes([]);
      const allPairs = benchMinutes(pairs) - setup;
      const expected = Math.min(registered, turnout.get(id) ?? registered);
      result.set(id, {
        pairs: Math.round(expected),
        minutes: setup + (registered === 0 ? 0 : Math.round((allPairs * expected) / registered)),
      });
    }
    return result;
  }

  /** Pairs serviced per visit, averaged over each stop's last worked visits that serviced any. */
  private async averagePairsServiced(stopIds: readonly string[]): Promise<Map<string, number>> {
    const rows = await this.dataSource.query<{ stop_id: string; pairs: number }[]>(
      `WITH recent AS (
         SELECT v.stop_id, v.worked_on,
                row_number() OVER (PARTITION BY v.stop_id ORDER BY v.worked_on DESC) AS nth
           FROM stop_visits v WHERE v.stop_id = ANY($1)),
       serviced AS (
         SELECT r.stop_id, r.worked_on, count(h.id) AS pairs
           FROM recent r
           JOIN customers c ON c.stop_id = r.stop_id
           JOIN shears s ON s.customer_id = c.id
           JOIN shear_history h ON h.shear_id = s.id AND h.kind = 'serviced' AND h.happened_on = r.worked_on
          WHERE r.nth <= $2
          GROUP BY 1, 2)
       SELECT stop_id, avg(pairs)::float AS pairs FROM serviced GROUP BY 1`,
      [stopIds, VISITS_LOOKED_AT],
    );
    return new Map(rows.map((row) => [row.stop_id, row.pairs]));
  }
}
