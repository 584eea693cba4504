import { businessMoment } from './booking-clock';

describe('businessMoment', () => {
  it('reads the date and minute in the business time zone, not in UTC', () => {
    // 03:30 UTC on 2 March is 21:30 on 1 March in Chicago (UTC-6 in winter).
    expect(businessMoment('America/Chicago', new Date('2026-03-02T03:30:00Z'))).toEqual({
      date: '2026-03-01',
      minute: 21 * 60 + 30,
    });
    expect(businessMoment('UTC', new Date('2026-03-02T03:30:00Z'))).toEqual({ date: '2026-03-02', minute: 210 });
  });

  it('counts midnight as minute 0 and follows daylight saving time', () => {
    expect(businessMoment('America/Chicago', new Date('2026-07-01T05:00:00Z'))).toEqual({
      date: '2026-07-01',
      minute: 0,
    });
  });
});
