import { describe, expect, it } from 'vitest';
import {
  addressQuery,
  copyMondayToWeekdays,
  dayProblem,
  draftToHours,
  emptyStopValues,
  formPathOf,
  hoursToDraft,
  percentToBp,
  stopToValues,
  valuesToInput,
} from './stop-form-draft';
import { detail } from './testing/stop-fixtures';

describe('the stop form draft', () => {
  it('turns a percent with two decimals into basis points and back', () => {
    expect(percentToBp(8.25)).toBe(825);
    expect(percentToBp(7.1)).toBe(710);
    // 0.29 * 100 is 28.999999999999996 in floating point.
    expect(percentToBp(0.29)).toBe(29);
    expect(stopToValues(detail({ taxRateBp: 825 })).taxPercent).toBe(8.25);
  });

  it('leaves closed weekdays out of the opening hours', () => {
    const draft = hoursToDraft({ mon: [{ opens: '09:00', closes: '17:00' }] });
    expect(draft.tue).toEqual({ open: false, windows: [] });
    draft.wed = { open: false, windows: [{ opens: '10:00', closes: '12:00' }] };
    expect(draftToHours(draft)).toEqual({ mon: [{ opens: '09:00', closes: '17:00' }] });
  });

  it('copies Monday to Tuesday through Friday, not the weekend', () => {
    const draft = hoursToDraft({
      mon: [
        { opens: '09:00', closes: '12:00' },
        { opens: '13:00', closes: '18:00' },
      ],
      sat: [{ opens: '10:00', closes: '14:00' }],
    });
    const hours = draftToHours(copyMondayToWeekdays(draft));
    expect(hours.fri).toEqual(hours.mon);
    expect(hours.tue).toHaveLength(2);
    expect(hours.sat).toEqual([{ opens: '10:00', closes: '14:00' }]);
    expect(hours.sun).toBeUndefined();
  });

  it('checks a day with the shared opening-hours rule', () => {
    expect(dayProblem('mon', { open: true, windows: [{ opens: '09:00', closes: '17:00' }] })).toBeNull();
    expect(dayProblem('mon', { open: true, windows: [{ opens: '17:00', closes: '09:00' }] })).toBe(
      'Monday: a window must close after it opens.',
    );
    expect(dayProblem('tue', { open: true, windows: [] })).toMatch(/Add an opening window/);
    expect(dayProblem('tue', { open: false, windows: [] })).toBeNull();
  });

  it('sends coordinates on create only when both are given, marking a picked pin', () => {
    const values = { ...emptyStopValues(), name: 'A', street: '1 Elm St', city: 'Riverton' };
    expect(valuesToInput(values, { picked: false }).latitude).toBeUndefined();
    const input = valuesToInput({ ...values, latitude: 45.1, longitude: -122.2 }, { picked: true });
    expect(input).toMatchObject({ latitude: 45.1, longitude: -122.2, geocodeChoice: 'picked' });
    expect(valuesToInput({ ...values, latitude: 45.1, longitude: -122.2 }, { picked: false })).not.toHaveProperty(
      'geocodeChoice',
    );
  });

  it('leaves unchanged coordinates out on edit, so a new address is geocoded again', () => {
    const stop = detail({ latitude: 45.5, longitude: -122.6 });
    const values = { ...stopToValues(stop), street: '99 Oak Avenue' };
    const input = valuesToInput(values, { saved: stop, picked: false });
    expect(input.latitude).toBeUndefined();
    expect(input.longitude).toBeUndefined();
    expect(input.street).toBe('99 Oak Avenue');
    const moved = valuesToInput({ ...values, latitude: 45.6 }, { saved: stop, picked: false });
    expect(moved).toMatchObject({ latitude: 45.6, longitude: -122.6 });
  });

  it('takes the pin away when both coordinates of a saved pin are cleared', () => {
    const stop = detail({ latitude: 45.5, longitude: -122.6 });
    const cleared = valuesToInput(
      { ...stopToValues(stop), latitude: '', longitude: '' },
      { saved: stop, picked: false },
    );
    expect(cleared).toMatchObject({ latitude: null, longitude: null });
    const never = detail({ latitude: null, longitude: null });
    expect(valuesToInput(stopToValues(never), { saved: never, picked: false })).not.toHaveProperty('latitude');
  });

  it('sends empty contact fields as null and uses the kind default for an empty cadence', () => {
    const values = { ...emptyStopValues(), kind: 'grooming-shop' as const, cadenceWeeks: '' as const };
    const input = valuesToInput(values, { picked: false });
    expect(input).toMatchObject({ phone: null, email: null, cadenceWeeks: 5, country: 'US' });
  });

  it('puts server field errors on the form field that shows them', () => {
    expect(formPathOf('name')).toBe('name');
    expect(formPathOf('taxRateBp')).toBe('taxPercent');
    expect(formPathOf('openingHours.mon[0]')).toBe('openingHours.mon');
    expect(formPathOf('openingHours.fri.1.closes')).toBe('openingHours.fri');
    expect(formPathOf('closedDates.2')).toBe('closedDates');
    expect(formPathOf('preferredWeekdays[0]')).toBe('preferredWeekdays');
  });

  it('writes the address as one line for the geocoder', () => {
    expect(
      addressQuery({ street: ' 12 Maple Street ', city: 'Riverton', region: 'OR', postalCode: '97000', country: 'US' }),
    ).toBe('12 Maple Street, Riverton, OR 97000, US');
  });
});
