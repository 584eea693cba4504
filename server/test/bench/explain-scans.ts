/** Reads an EXPLAIN (FORMAT JSON) plan for the sequential scans a report benchmark should flag. */
export interface PlanNode {
  'Node Type': string;
  'Relation Name'?: string;
  'Actual Rows'?: number;
  'Actual Loops'?: number;
  'Rows Removed by Filter'?: number;
  Plans?: PlanNode[];
}

export interface SeqScan {
  table: string;
  tableRows: number;
  /** Rows the scan went through (kept and filtered out), over all its loops. */
  rowsRead: number;
}

/** Every Seq Scan in the plan tree of a table the statistics put over `minRows` rows. */
export function seqScansOver(plan: PlanNode, tableRows: ReadonlyMap<string, number>, minRows: number): SeqScan[] {
  const found: SeqScan[] = [];
  const visit = (node: PlanNode) => {
    const table = node['Relation Name'];
    if (node['Node Type'] === 'Seq Scan' && table !== undefined && (tableRows.get(table) ?? 0) > minRows) {
      const loops = node['Actual Loops'] ?? 1;
      found.push({
        table,
        tableRows: Math.round(tableRows.get(table)!),
        rowsRead: Math.round(((node['Actual Rows'] ?? 0) + (node['Rows Removed by Filter'] ?? 0)) * loops),
      });
    }
    for (const child of node.Plans ?? []) visit(child);
  };
  visit(plan);
  return found;
}
