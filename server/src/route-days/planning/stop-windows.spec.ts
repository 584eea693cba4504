import { benchWindows, candidateDates, isOpenOn, type StopCalendar } from './stop-windows';

describe('stop windows for planning', () => {
  // 2026-12-07 is a Monday (ISO 8601 week 50 of 2026).
  const monday = '2026-12-07';
  const tuesday = '2026-12-08';
  const wednesday = '2026-12-09';
  const stop: StopCalendar = {
    openingHours: {
      mon: [
        { opens: '09:00', closes: '12:00' },
        { opens: '13:00', closes: '17:30' },
      ],
      tue: [{ opens: '10:00', closes: '10:20' }],
    },
    closedDates: [wednesday],
    preferredWeekdays: [],
  };

  it('turns opening windows into latest bench starts, so the work ends by closing', () => {
    expect(benchWindows(stop, monday, 30)).toEqual([
      { open: 540, close: 690 },
      { open: 780, close: 1020 },
    ]);
  });

  it('drops a window too short for the bench work, and a shut day', () => {
    expect(benchWindows(stop, tuesday, 30)).toEqual([]);
    expect(benchWindows(stop, tuesday, 20)).toEqual([{ open: 600, close: 600 }]);
    expect(
      benchWindows({ ...stop, openingHours: { wed: [{ opens: '09:00', closes: '17:00' }] } }, wednesday, 10),
    ).toEqual([]);
    expect(isOpenOn(stop, wednesday)).toBe(false);
  });

  it('prefers the preferred weekdays when one is open that week, else any open day', () => {
    const days = [monday, tuesday, wednesday];
    expect(candidateDates(stop, days)).toEqual([monday, tuesday]);
    expect(candidateDates({ ...stop, preferredWeekdays: ['tue'] }, days)).toEqual([tuesday]);
    expect(candidateDates({ ...stop, preferredWeekdays: ['wed'] }, days)).toEqual([monday, tuesday]);
  });
});
