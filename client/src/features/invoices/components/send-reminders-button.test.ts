import { describe, expect, it } from 'vitest';
import { remindersWording } from './send-reminders-button';

describe('the reminders run in words', () => {
  it('counts sent, skipped and stopped reminders', () => {
    expect(remindersWording({ queued: 3, sent: 3, skipped: 0, cancelled: 1 })).toBe(
      'Reminders: 3 sent, 0 skipped (a later stage was due), 1 stopped (paid or void)',
    );
  });

  it('adds the ones that could not go only when there are some', () => {
    expect(remindersWording({ queued: 2, sent: 1, skipped: 2, cancelled: 0, failed: 1 })).toBe(
      'Reminders: 1 sent, 2 skipped (a later stage was due), 0 stopped (paid or void), ' +
        '1 could not be sent (no e-mail address, or the mail relay refused)',
    );
  });
});
