import { describe, expect, it } from 'vitest';
import { readReminderDays, termsProblem } from './profile-rules';

describe('the reminder days', () => {
  it('come back in order as numbers', () => {
    expect(readReminderDays([21, '7', 45])).toEqual({ days: [7, 21, 45] });
  });

  it.each([
    [[], 'Keep at least one reminder day.'],
    [[1, 2, 3, 4, 5, 6], 'At most 5 reminders.'],
    [[7, 7], 'Each reminder day can be there only once.'],
    [[0], 'Each reminder day is a whole number from 1 to 365.'],
    [[366], 'Each reminder day is a whole number from 1 to 365.'],
    [[2.5], 'Each reminder day is a whole number from 1 to 365.'],
    [[''], 'Each reminder day is a whole number from 1 to 365.'],
  ])('refuse %j', (values, error) => {
    expect(readReminderDays(values)).toEqual({ error });
  });
});

describe('the payment terms', () => {
  it('are 0 to 120 whole days', () => {
    expect(termsProblem(0)).toBeNull();
    expect(termsProblem(120)).toBeNull();
    expect(termsProblem(121)).toMatch(/0 to 120/);
    expect(termsProblem('')).toMatch(/0 to 120/);
    expect(termsProblem(7.5)).toMatch(/whole number/);
  });
});
