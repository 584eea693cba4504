import { timeline, type DayFrame, type TimelineStop } from './timeline';

describe('timeline (times for stops in an order a person chose)', () => {
  const frame: DayFrame = { shiftStart: 480, latestFinish: 1080, lunch: { earliest: 690, latest: 810, minutes: 30 } };
  const stop = (over: Partial<TimelineStop> = {}): TimelineStop => ({
    benchMinutes: 60,
    windows: [{ open: 540, close: 960 }],
    driveMinutes: 20,
    km: 10,
    ...over,
  });
  const back = { driveMinutes: 20, km: 10 };

  it('waits for the opening, then works, and adds up the day', () => {
    const sut = timeline(frame, [stop(), stop()], back);
    expect(sut.visits[0]).toEqual({ arrival: 500, start: 540, leave: 600, problem: null });
    expect(sut.visits[1]).toEqual({ arrival: 620, start: 620, leave: 680, problem: null });
    expect(sut).toMatchObject({ departure: 480, distanceKm: 30, driveMinutes: 60, benchMinutes: 120 });
    // Left the last stop at 11:20, before the break opens: the break waits for 11:30 (690) and ends at 12:00.
    expect(sut.lunch).toEqual({ start: 690, afterStops: 2, minutes: 30 });
    expect(sut.finish).toBe(720 + 20);
  });

  it('takes the break between stops once its window has opened', () => {
    const sut = timeline(frame, [stop({ benchMinutes: 200 }), stop()], back);
    expect(sut.visits[0]!.leave).toBe(740);
    expect(sut.lunch).toEqual({ start: 740, afterStops: 1, minutes: 30 });
    expect(sut.visits[1]!.arrival).toBe(740 + 30 + 20);
  });

  it('marks, never refuses: after closing, shut that day, and a day run too long', () => {
    const late = timeline(frame, [stop({ windows: [{ open: 540, close: 490 }] })], back);
    expect(late.visits[0]!.problem).toBe('after-closing');
    const shut = timeline(frame, [stop({ windows: [] })], back);
    expect(shut.visits[0]!.problem).toBe('closed-that-day');
    const long = timeline(frame, [stop({ benchMinutes: 600, windows: [{ open: 0, close: 1400 }] })], back);
    expect(long.finish).toBeGreaterThan(frame.latestFinish);
    expect(long.visits[0]!.problem).toBe('day-too-long');
  });

  it('gives an empty day no times', () => {
    expect(timeline(frame, [], back)).toMatchObject({ visits: [], departure: null, finish: null, distanceKm: 0 });
  });
});
