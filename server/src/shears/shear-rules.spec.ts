import { RuleError } from '@keenroute/shared';
import { checkedShear, movedSummary, statusSummary } from './shear-rules';

const shape = { edgeType: 'convex', toolKind: 'straight', lengthIn: 6.5, handedness: 'left', use: 'grooming' } as const;

describe('checkedShear', () => {
  it('returns the shear the shared rules accept', () => {
    expect(checkedShear(shape)).toEqual(shape);
  });

  it('names the refused field as the request body does', () => {
    const refusal = (() => {
      try {
        checkedShear({ ...shape, lengthIn: 6.3 });
      } catch (error) {
        return error;
      }
    })();
    expect(refusal).toBeInstanceOf(RuleError);
    expect(refusal).toMatchObject({ field: 'lengthIn', message: expect.stringMatching(/quarter inches/) });
    expect(() => checkedShear({ ...shape, edgeType: 'laser' as never })).toThrow(
      expect.objectContaining({ field: 'edgeType' }),
    );
  });
});

describe('history summaries', () => {
  it('says what happened in words', () => {
    expect(statusSummary('lost')).toBe('Marked lost');
    expect(statusSummary('retired')).toBe('Marked retired');
    expect(statusSummary('in-service')).toBe('Back in service');
    expect(movedSummary('Mara', 'Bryn')).toBe('Moved from Mara to Bryn');
  });
});
