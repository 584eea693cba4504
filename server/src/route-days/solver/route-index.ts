import type { Ctx } from './route-eval';

/**
 * Which route each stop is on and where (-1: unplanned), and each route's places as [start, ...stops, end]
 * (places[vi][k + 1] is the k-th stop's), kept up to date as moves change routes.
 */
export class RouteIndex {
  readonly routeOf: Int32Array;
  readonly posOf: Int32Array;
  readonly places: Int32Array[];

  constructor(
    private readonly ctx: Ctx,
    routes: readonly (readonly number[])[],
  ) {
    this.routeOf = new Int32Array(ctx.stops.length).fill(-1);
    this.posOf = new Int32Array(ctx.stops.length).fill(-1);
    this.places = routes.map(() => new Int32Array(0));
    routes.forEach((_, vi) => this.reindex(routes, vi));
  }

  reindex(routes: readonly (readonly number[])[], vi: number): void {
    const seq = routes[vi]!;
    const v = this.ctx.vehicles[vi]!;
    const pl = new Int32Array(seq.length + 2);
    pl[0] = v.startPlace;
    pl[seq.length + 1] = v.endPlace;
    seq.forEach((si, k) => {
      this.routeOf[si] = vi;
      this.posOf[si] = k;
      pl[k + 1] = this.ctx.stops[si]!.place;
    });
    this.places[vi] = pl;
  }

  /** After seq[from..to] of route vi changed in place (same stops on the route). */
  reindexRange(routes: readonly (readonly number[])[], vi: number, from: number, to: number): void {
    const seq = routes[vi]!;
    const pl = this.places[vi]!;
    for (let k = from; k <= to; k++) {
      const si = seq[k]!;
      this.posOf[si] = k;
      pl[k + 1] = this.ctx.stops[si]!.place;
    }
  }
}

/** A work queue of stops with don't-look bits: a stop is looked at again only after a change near it. */
export class StopQueue {
  private readonly queued: Uint8Array;
  private readonly items: number[] = [];
  private head = 0;
  /** Every stop woken after the start (near a change), once each. */
  readonly woken = new Set<number>();
  private started = false;

  constructor(stopCount: number, initial: Iterable<number>) {
    this.queued = new Uint8Array(stopCount);
    for (const si of initial) this.push(si);
    this.started = true;
  }

  push(si: number | undefined): void {
    if (si === undefined || si < 0) return;
    if (this.started) this.woken.add(si);
    if (this.queued[si]) return;
    this.queued[si] = 1;
    this.items.push(si);
  }

  pop(): number | undefined {
    if (this.head >= this.items.length) return undefined;
    const si = this.items[this.head++]!;
    this.queued[si] = 0;
    if (this.head > 4096 && this.head * 2 > this.items.length) {
      this.items.splice(0, this.head);
      this.head = 0;
    }
    return si;
  }
}
