import { noticeRecipients } from './visit-notice-delivery';
import { bookingUrl, longDayLabel, shortDayLabel, visitNoticeMail } from './visit-notice-mail';

describe('visitNoticeMail', () => {
  const sut = (arrival: number, stopName = 'Salon Quill (demo)') =>
    visitNoticeMail({
      to: 'desk@quill.demo.test',
      greetingName: 'Avery',
      stopName,
      day: '2026-12-08',
      arrival,
      bookingUrl: bookingUrl('http://127.0.0.1:3000/', 'c0ffee00-0000-4000-8000-000000000001', '2026-12-08'),
    });

  it('names the day and the arrival window in the subject', () => {
    expect(sut(9 * 60 + 7).subject).toBe('Keenroute visit on Tue 8 Dec: expected 09:00–10:00');
    expect(sut(14 * 60 + 45).subject).toBe('Keenroute visit on Tue 8 Dec: expected 14:45–15:45');
  });

  it('says the time is an estimate and links to booking for that stop and day', () => {
    const mail = sut(9 * 60 + 7);
    expect(mail.text).toContain('Tuesday 8 December 2026');
    expect(mail.text).toContain('between 09:00 and 10:00');
    expect(mail.text).toMatch(/estimate/);
    expect(mail.text).toContain('http://127.0.0.1:3000/book?stop=c0ffee00-0000-4000-8000-000000000001&day=2026-12-08');
    expect(mail.html).toContain(
      'href="http://127.0.0.1:3000/book?stop=c0ffee00-0000-4000-8000-000000000001&amp;day=2026-12-08"',
    );
  });

  it('escapes names in the HTML part', () => {
    expect(sut(600, 'Cut <b>&</b> Co').html).toContain('Cut &lt;b&gt;&amp;&lt;/b&gt; Co');
  });

  it('reads a date as a calendar day whatever the zone', () => {
    expect(shortDayLabel('2027-01-01')).toBe('Fri 1 Jan');
    expect(longDayLabel('2026-03-08')).toBe('Sunday 8 March 2026');
  });
});

describe('noticeRecipients', () => {
  it('puts the stop first, then consenting customers, once per address whatever its case', () => {
    const sut = noticeRecipients({ name: 'Salon Quill', email: 'Desk@Quill.demo.test' }, [
      { id: 'a', name: 'Avery', email: 'avery@demo.test' },
      { id: 'b', name: 'Blake', email: 'desk@quill.demo.test ' },
      { id: 'c', name: 'Casey', email: null },
    ]);
    expect(sut).toEqual([
      { email: 'desk@quill.demo.test', customerId: null, greetingName: 'Salon Quill' },
      { email: 'avery@demo.test', customerId: 'a', greetingName: 'Avery' },
    ]);
  });

  it('has no one to tell when nobody has an address', () => {
    expect(noticeRecipients({ name: 'Salon', email: null }, [])).toEqual([]);
  });
});
