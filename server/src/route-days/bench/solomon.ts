/**
 * Solomon VRPTW instances (M. M. Solomon, Operations Research 35(2), 1987) as laid out in shared/reference/solomon:
 * the first line is the vehicle capacity, then `id x y demand ready due service` per node, node 0 the depot.
 */

export interface SolomonNode {
  id: number;
  x: number;
  y: number;
  demand: number;
  ready: number;
  due: number;
  service: number;
}

export interface SolomonInstance {
  name: string;
  capacity: number;
  /** nodes[i].id === i; nodes[0] is the depot. */
  nodes: SolomonNode[];
  /** The depot's due time: every route must be back by then. */
  horizon: number;
}

export function parseSolomon(text: string, name: string): SolomonInstance {
  const lines = text
    .split(/\r?\n/)
    .map((l) => l.trim())
    .filter((l) => l !== '');
  const capacity = Number(lines[0]);
  if (!Number.isFinite(capacity) || capacity <= 0) {
    throw new Error(`Solomon: first line must be the vehicle capacity, got "${lines[0] ?? ''}"`);
  }
  const nodes: SolomonNode[] = lines.slice(1).map((line, index) => {
    const values = line.split(/\s+/).map(Number);
    if (values.length !== 7 || values.some((v) => !Number.isFinite(v))) {
      throw new Error(`Solomon: bad node line "${line}"`);
    }
    const [id, x, y, demand, ready, due, service] = values as [number, number, number, number, number, number, number];
    if (id !== index) throw new Error(`Solomon: expected node ${index}, got ${id}`);
    if (ready > due) throw new Error(`Solomon: node ${id} has ready ${ready} after due ${due}`);
    return { id, x, y, demand, ready, due, service };
  });
  const depot = nodes[0];
  if (!depot || nodes.length < 2) throw new Error('Solomon: need a depot and at least one customer');
  return { name, capacity, nodes, horizon: depot.due };
}

export interface SolomonCheck {
  distance: number;
  problems: string[];
}

/**
 * Recomputes a set of routes (customer ids) independently of the solver: real-valued distance, and every rule the
 * README states (each customer once, capacity, service begins by `due` after waiting, back at the depot by horizon).
 * Customers in `unplanned` must appear in no route; every other customer exactly once.
 */
export function checkSolomonRoutes(
  instance: SolomonInstance,
  routes: readonly (readonly number[])[],
  unplanned: readonly number[] = [],
): SolomonCheck {
  const { nodes, capacity, horizon } = instance;
  const dist = (a: SolomonNode, b: SolomonNode): number => Math.hypot(a.x - b.x, a.y - b.y);
  const depot = nodes[0] as SolomonNode;
  const problems: string[] = [];
  const served = new Map<number, number>();
  let distance = 0;
  routes.forEach((route, r) => {
    let at = depot;
    let time = depot.ready;
    let load = 0;
    for (const id of route) {
      const node = nodes[id];
      if (!node || id === 0) {
        problems.push(`route ${r + 1}: ${id} is not a customer`);
        continue;
      }
      served.set(id, (served.get(id) ?? 0) + 1);
      distance += dist(at, node);
      time = Math.max(time + dist(at, node), node.ready);
      if (time > node.due + 1e-6) problems.push(`route ${r + 1}: customer ${id} starts at ${time} after ${node.due}`);
      time += node.service;
      load += node.demand;
      at = node;
    }
    distance += dist(at, depot);
    time += dist(at, depot);
    if (time > horizon + 1e-6) problems.push(`route ${r + 1}: back at ${time} after the horizon ${horizon}`);
    if (load > capacity) problems.push(`route ${r + 1}: load ${load} over capacity ${capacity}`);
  });
  for (const node of nodes.slice(1)) {
    const count = served.get(node.id) ?? 0;
    const expected = unplanned.includes(node.id) ? 0 : 1;
    if (count !== expected) problems.push(`customer ${node.id} is served ${count} times`);
  }
  return { distance, problems };
}
