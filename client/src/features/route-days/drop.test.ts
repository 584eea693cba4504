import { describe, expect, it } from 'vitest';
import { dayDropId, resolveDrop, stopDragId, unplannedDragId } from './drop';
import { week } from './testing/fixtures';
import { moveStop, replaceDays } from './week-cache';

describe('resolveDrop', () => {
  const plan = week();

  it('reorders within a day: a stop dropped on another takes its place', () => {
    expect(resolveDrop(plan, stopDragId('s-paws'), stopDragId('s-maple'))).toEqual({
      stopId: 's-paws',
      dayId: 'rd-mon-sasha',
      position: 0,
    });
  });

  it('moves to another day before the stop it is dropped on', () => {
    expect(resolveDrop(plan, stopDragId('s-maple'), stopDragId('s-oak'))).toEqual({
      stopId: 's-maple',
      dayId: 'rd-mon-rowan',
      position: 0,
    });
  });

  it('puts a stop from the unplanned list last on an empty day', () => {
    expect(resolveDrop(plan, unplannedDragId('s-cuts'), dayDropId('rd-tue-sasha'))).toEqual({
      stopId: 's-cuts',
      dayId: 'rd-tue-sasha',
      position: 0,
    });
  });

  it('moves a stop to the end of its own day when dropped on the day', () => {
    expect(resolveDrop(plan, stopDragId('s-maple'), dayDropId('rd-mon-sasha'))).toEqual({
      stopId: 's-maple',
      dayId: 'rd-mon-sasha',
      position: 1,
    });
  });

  it('does nothing for a drop where the stop already is, or on nothing', () => {
    expect(resolveDrop(plan, stopDragId('s-maple'), stopDragId('s-maple'))).toBeNull();
    expect(resolveDrop(plan, stopDragId('s-paws'), dayDropId('rd-mon-sasha'))).toBeNull();
    expect(resolveDrop(plan, stopDragId('s-maple'), null)).toBeNull();
    expect(resolveDrop(plan, stopDragId('s-maple'), unplannedDragId('s-cuts'))).toBeNull();
  });
});

describe('moveStop', () => {
  it('reorders, renumbers and locks the moved stop', () => {
    const moved = moveStop(week(), { stopId: 's-paws', dayId: 'rd-mon-sasha', position: 0 });
    const monday = moved.days.find((day) => day.id === 'rd-mon-sasha');
    expect(monday?.stops.map((stop) => [stop.stopId, stop.position, stop.locked])).toEqual([
      ['s-paws', 0, true],
      ['s-maple', 1, false],
    ]);
  });

  it('takes a stop off one day and onto another', () => {
    const moved = moveStop(week(), { stopId: 's-maple', dayId: 'rd-tue-sasha', position: 0 });
    expect(moved.days.find((day) => day.id === 'rd-mon-sasha')?.stops.map((stop) => stop.stopId)).toEqual(['s-paws']);
    expect(moved.days.find((day) => day.id === 'rd-tue-sasha')?.stops.map((stop) => stop.stopId)).toEqual(['s-maple']);
  });

  it('brings a stop from the unplanned list onto a day', () => {
    const moved = moveStop(week(), { stopId: 's-cuts', dayId: 'rd-mon-sasha', position: 1 });
    expect(moved.unplanned).toEqual([]);
    expect(moved.days[0]?.stops.map((stop) => stop.stopId)).toEqual(['s-maple', 's-cuts', 's-paws']);
  });
});

describe('replaceDays', () => {
  it('swaps in the changed days and drops placed stops from the unplanned list', () => {
    const plan = week();
    const tuesday = { ...plan.days[2]!, version: 2, stops: [{ ...plan.days[0]!.stops[0]!, stopId: 's-cuts' }] };
    const next = replaceDays(plan, [tuesday]);
    expect(next.days[2]).toBe(tuesday);
    expect(next.days[0]).toBe(plan.days[0]);
    expect(next.unplanned).toEqual([]);
  });
});
