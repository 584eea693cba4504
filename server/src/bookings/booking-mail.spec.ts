import type { PublicBookingDto } from './dto/booking-response.dto';
import { bookingConfirmationMail, manageUrl } from './booking-mail';

describe('bookingConfirmationMail', () => {
  const booking: PublicBookingDto = {
    id: 'b1',
    status: 'booked',
    stop: { id: 's1', name: 'Pawsitive Grooming', city: 'Larkhaven' },
    day: '2026-12-08',
    routeDayId: 'rd1',
    arrivalWindow: { from: 600, to: 660 },
    mailIn: false,
    name: 'Lind, Avery',
    email: 'avery@demo.keenroute.test',
    phone: '555-0142',
    notes: '',
    items: [{ toolKind: 'straight', edgeType: 'convex', count: 2 }],
    estimateCents: 8400,
    benchMinutes: 36,
    cutoff: { date: '2026-12-07', minute: 1080 },
    changeable: true,
  };
  const link = manageUrl('http://127.0.0.1:3000/', 'tok');

  it('addresses the person with an address object, so a comma in the name cannot add a recipient', () => {
    const sut = bookingConfirmationMail(booking, link, 'USD');
    expect(sut.to).toEqual({ name: 'Lind, Avery', address: 'avery@demo.keenroute.test' });
  });

  it('carries the private link, the window, the estimate and the cutoff', () => {
    const sut = bookingConfirmationMail(booking, link, 'USD');
    expect(link).toBe('http://127.0.0.1:3000/drop-off/tok');
    expect(sut.subject).toBe('Your drop-off at Pawsitive Grooming on Tuesday 8 December 2026');
    expect(sut.text).toContain(link);
    expect(sut.text).toContain('between 10:00 and 11:00 (an estimate)');
    expect(sut.text).toContain('Estimated price: $84.00 (an estimate');
    expect(sut.text).toContain('until 18:00 on Monday 7 December 2026');
    expect(sut.text).toContain('- 2 × convex straight shear');
  });

  it('tells a mail-in where to send the shears instead of a day', () => {
    const sut = bookingConfirmationMail(
      { ...booking, mailIn: true, day: null, routeDayId: null, arrivalWindow: null, cutoff: null, estimateCents: null },
      link,
      'USD',
    );
    expect(sut.subject).toBe('Your mail-in drop-off is booked');
    expect(sut.text).toContain('The price is set at the bench.');
  });
});
