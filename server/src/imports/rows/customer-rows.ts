import type { CsvRecord } from '../import-kinds';
import { RowReader, type CellProblem, type RowRead } from './row-reader';

export const CUSTOMER_COLUMNS = [
  'name',
  'email',
  'phone',
  'stop_name',
  'stop_street',
  'notes',
  'visit_notice_consent',
] as const;
export const CUSTOMER_REQUIRED_COLUMNS = ['name'] as const;

export interface CustomerDraft {
  name: string;
  email: string | null;
  phone: string | null;
  stopName: string | null;
  stopStreet: string | null;
  notes: string;
  visitNoticeConsent: boolean;
}

export interface CustomerReady extends CustomerDraft {
  stopId: string | null;
}

/** A stop as the customer look-up needs it. */
export interface StopByName {
  id: string;
  name: string;
  street: string;
}

export function readCustomerRow(record: CsvRecord): RowRead<CustomerDraft> {
  const reader = new RowReader(record);
  const name = reader.text('name', 120, true);
  const email = reader.email('email');
  const phone = reader.optionalText('phone', 40);
  const stopName = reader.optionalText('stop_name', 120);
  const stopStreet = reader.optionalText('stop_street', 200);
  if (stopStreet !== null && stopName === null) {
    reader.problem('stop_name', "Give the stop's name as well as its street.");
  }
  const notes = reader.text('notes', 2000);
  const visitNoticeConsent = reader.flag('visit_notice_consent');
  return reader.result(() => ({ name, email, phone, stopName, stopStreet, notes, visitNoticeConsent }));
}

/** Which stop a row names: by name, and by street too when the name alone matches several. */
function findStop(
  draft: CustomerDraft,
  stopsByName: ReadonlyMap<string, readonly StopByName[]>,
): { stopId: string | null; problem?: CellProblem } {
  if (draft.stopName === null) return { stopId: null };
  const named = stopsByName.get(draft.stopName.toLowerCase()) ?? [];
  const street = draft.stopStreet?.toLowerCase();
  const matches = street === undefined ? named : named.filter((stop) => stop.street.toLowerCase() === street);
  if (matches.length === 1) return { stopId: matches[0]!.id };
  if (named.length === 0) {
    return { stopId: null, problem: { column: 'stop_name', message: `No stop is named "${draft.stopName}".` } };
  }
  if (matches.length === 0) {
    const message = `No stop named "${draft.stopName}" is on ${draft.stopStreet}; it is on ${named.map((stop) => stop.street).join(', ')}.`;
    return { stopId: null, problem: { column: 'stop_street', message } };
  }
  const message =
    street === undefined
      ? `${matches.length} stops are named "${draft.stopName}": add stop_street to say which.`
      : `${matches.length} stops named "${draft.stopName}" are on ${draft.stopStreet}: change one in Keenroute first.`;
  return { stopId: null, problem: { column: street === undefined ? 'stop_street' : 'stop_name', message } };
}

/**
 * Resolves each customer's stop and checks e-mails against the rows before it and the customers already in
 * Keenroute. Call it once per file: it remembers the e-mails it has seen.
 */
export function customerResolver(
  existingEmails: ReadonlySet<string>,
  stopsByName: ReadonlyMap<string, readonly StopByName[]>,
): (draft: CustomerDraft, row: number) => { ready: CustomerReady | null; problems: CellProblem[] } {
  const firstRowOf = new Map<string, number>();
  return (draft, row) => {
    const problems: CellProblem[] = [];
    if (draft.email !== null) {
      const earlier = firstRowOf.get(draft.email);
      if (earlier !== undefined) {
        problems.push({ column: 'email', message: `Same e-mail as row ${earlier}.` });
      } else {
        firstRowOf.set(draft.email, row);
        if (existingEmails.has(draft.email)) {
          problems.push({ column: 'email', message: 'A customer with this e-mail is already in Keenroute.' });
        }
      }
    }
    const { stopId, problem } = findStop(draft, stopsByName);
    if (problem) problems.push(problem);
    return { ready: problems.length === 0 ? { ...draft, stopId } : null, problems };
  };
}
