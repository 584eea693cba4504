import { daysOverdue } from '../invoice-balance';

/** What one run decides for one overdue invoice: the stage to send now and the earlier ones passed over. */
export interface StagePlan {
  /** The latest reminder stage that is due (days after the due date), sent now; null: none is due yet. */
  send: number | null;
  /** Earlier stages due as well: a run missed while the server was down, or the invoice made overdue late. */
  skip: number[];
}

/**
 * The reminder stages of an invoice that are due on `today`: every configured day count with due date + days ≤ today.
 * Only the latest goes out, so a customer never gets two or three reminders for one invoice in one morning.
 */
export function planStages(dueDate: string, reminderDays: readonly number[], today: string): StagePlan {
  const overdue = daysOverdue(dueDate, today);
  const due = [...new Set(reminderDays)].filter((days) => days > 0 && days <= overdue).sort((a, b) => a - b);
  if (due.length === 0) return { send: null, skip: [] };
  return { send: due[due.length - 1]!, skip: due.slice(0, -1) };
}

/** Whether `stageDays` is the last reminder the business sends, which the e-mail words a little more firmly. */
export const isFinalStage = (stageDays: number, reminderDays: readonly number[]) =>
  reminderDays.length > 0 && stageDays >= Math.max(...reminderDays);
