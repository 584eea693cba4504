export const routeDaysQueryKey = ['route-days'] as const;

export function weekQueryKey(monday: string, sharpenerId = '') {
  return [...routeDaysQueryKey, 'week', monday, sharpenerId] as const;
}

/** Every cached copy of one week, whichever sharpener filter it was read with. */
export function weekQueryPrefix(monday: string) {
  return [...routeDaysQueryKey, 'week', monday] as const;
}

export function sheetQueryKey(routeDayId: string) {
  return [...routeDaysQueryKey, 'sheet', routeDayId] as const;
}

export const settingsQueryKey = [...routeDaysQueryKey, 'settings'] as const;
export const calendarFeedQueryKey = [...routeDaysQueryKey, 'calendar-feed'] as const;
