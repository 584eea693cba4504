import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import {
  benchMinutes,
  edgeRecipe,
  type BenchPair,
  type EdgeType,
  type Handedness,
  type ShearUse,
  type ToolKind,
} from '@keenroute/shared';
import type { DataSource } from 'typeorm';

export interface ExpectedBench {
  pairs: number;
  minutes: number;
}

interface ShearGroup {
  stop_id: string;
  edge_type: EdgeType;
  tool_kind: ToolKind;
  handedness: Handedness;
  length_in: number;
  use: ShearUse;
  count: number;
}

/**
 * Bench minutes expected at a stop visit, from the rules package's bench time: the setup plus every in-service shear
 * of the stop's active customers (each with its edge recipe's inside-edge honing). Booked drop-offs will refine this
 * when bookings exist; until then a stop's registered shears are what the sharpener plans for.
 */
@Injectable()
export class ExpectedBenchService {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  async forStops(stopIds: readonly string[]): Promise<Map<string, ExpectedBench>> {
    const result = new Map<string, ExpectedBench>();
    if (stopIds.length === 0) return result;
    const groups = await this.dataSource.query<ShearGroup[]>(
      `SELECT c.stop_id, s.edge_type, s.tool_kind, s.handedness, s.length_in::float AS length_in, s.use,
              count(*)::int AS count
         FROM shears s JOIN customers c ON c.id = s.customer_id
        WHERE c.stop_id = ANY($1) AND c.active AND s.status = 'in-service'
        GROUP BY 1, 2, 3, 4, 5, 6`,
      [stopIds],
    );
    const pairsByStop = new Map<string, BenchPair[]>();
    for (const group of groups) {
      const recipe = edgeRecipe({
        edgeType: group.edge_type,
        toolKind: group.tool_kind,
        handedness: group.handedness,
        lengthIn: group.length_in,
        use: group.use,
      });
      const pairs = pairsByStop.get(group.stop_id) ?? [];
      pairs.push({
        edgeType: group.edge_type,
        toolKind: group.tool_kind,
        insideEdge: recipe.insideEdge !== null,
        count: group.count,
      });
      pairsByStop.set(group.stop_id, pairs);
    }
    for (const id of stopIds) {
      const pairs = pairsByStop.get(id) ?? [];
      result.set(id, {
        pairs: pairs.reduce((sum, pair) => sum + (pair.count ?? 1), 0),
        minutes: benchMinutes(pairs),
      });
    }
    return result;
  }
}
