import { isFinalStage, planStages } from './reminder-stages';

describe('planStages', () => {
  const days = [7, 21, 45];

  it('sends nothing before the first stage', () => {
    expect(planStages('2026-12-01', days, '2026-12-01')).toEqual({ send: null, skip: [] });
    expect(planStages('2026-12-01', days, '2026-12-07')).toEqual({ send: null, skip: [] });
  });

  it('sends a stage on the day it falls due and after', () => {
    expect(planStages('2026-12-01', days, '2026-12-08')).toEqual({ send: 7, skip: [] });
    expect(planStages('2026-12-01', days, '2026-12-21')).toEqual({ send: 7, skip: [] });
    expect(planStages('2026-12-01', days, '2026-12-22')).toEqual({ send: 21, skip: [7] });
  });

  it('sends only the latest when several are due at once, across a month and year end', () => {
    expect(planStages('2026-11-20', days, '2027-01-04')).toEqual({ send: 45, skip: [7, 21] });
    expect(planStages('2026-11-20', days, '2027-01-03')).toEqual({ send: 21, skip: [7] });
  });

  it('reads the stages in any order and ignores repeats', () => {
    expect(planStages('2026-12-01', [21, 7, 7], '2026-12-30')).toEqual({ send: 21, skip: [7] });
  });

  it('sends nothing for a profile without reminder days', () => {
    expect(planStages('2026-01-01', [], '2026-12-30')).toEqual({ send: null, skip: [] });
  });
});

describe('isFinalStage', () => {
  it('is the largest configured day count', () => {
    expect(isFinalStage(45, [7, 21, 45])).toBe(true);
    expect(isFinalStage(21, [7, 21, 45])).toBe(false);
    expect(isFinalStage(7, [])).toBe(false);
  });
});
