import { describe, expect, it } from 'vitest';
import { parseComingDueSearch } from './use-coming-due-search';
import { parseStopSearch, STOP_LIST_DEFAULTS } from './use-stop-search';

describe('reading the stops list from the URL', () => {
  it('falls back to the defaults for anything it does not know', () => {
    expect(parseStopSearch(new URLSearchParams('kind=castle&sort=colour&active=maybe&page=0&pageSize=7'))).toEqual(
      STOP_LIST_DEFAULTS,
    );
  });

  it('reads every filter', () => {
    const params = parseStopSearch(
      new URLSearchParams('q=+maple+&kind=grooming-shop&sharpener=u1&active=all&sort=nextDueOn&order=desc&page=3'),
    );
    expect(params).toEqual({
      page: 3,
      pageSize: 25,
      q: 'maple',
      kind: 'grooming-shop',
      sharpener: 'u1',
      active: 'all',
      sort: 'nextDueOn',
      order: 'desc',
    });
  });
});

describe('reading coming due from the URL', () => {
  it('works from the Monday of the week of any date, and this week otherwise', () => {
    expect(parseComingDueSearch(new URLSearchParams('week=2025-03-13'), '2025-01-06').week).toBe('2025-03-10');
    expect(parseComingDueSearch(new URLSearchParams('week=soon'), '2025-01-06').week).toBe('2025-01-06');
  });
});
