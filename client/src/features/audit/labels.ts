import type { Role } from '@keenroute/shared';
import { ROLE_LABELS } from '@/config/roles';
import { money, REFUND_METHOD_LABELS } from '@/features/invoices/labels';
import type { InvoicePaymentMethod, RefundMethod } from '@/features/invoices/types';
import { upperFirst } from '@/lib/format';
import type { AuditAction, AuditDetail, AuditEntry } from './types';

export const AUDIT_ACTION_LABELS: Readonly<Record<AuditAction, string>> = {
  'sign-in': 'Signed in',
  'sign-in-failed': 'Sign-in refused',
  'user-invited': 'Invited',
  'role-changed': 'Role changed',
  'user-deactivated': 'Deactivated',
  'user-reactivated': 'Reactivated',
  'price-override': 'Price set by hand',
  'invoice-voided': 'Invoice voided',
  'credit-note-issued': 'Credit note',
  'payment-recorded': 'Payment',
};

export const AUDIT_ACTION_COLORS: Readonly<Record<AuditAction, string>> = {
  'sign-in': 'gray',
  'sign-in-failed': 'red',
  'user-invited': 'keenTeal',
  'role-changed': 'brass',
  'user-deactivated': 'dark',
  'user-reactivated': 'keenTeal',
  'price-override': 'brass',
  'invoice-voided': 'dark',
  'credit-note-issued': 'brass',
  'payment-recorded': 'green',
};

const REFUSALS: Record<string, string> = {
  'wrong-password': 'wrong password',
  'unknown-email': 'no account has this e-mail',
  deactivated: 'the account is deactivated',
  'no-password': 'the invitation was not accepted yet',
};

const PAID: Record<InvoicePaymentMethod, string> = {
  cash: 'in cash',
  cheque: 'by cheque',
  'card-terminal': 'by card on the terminal',
  online: 'online',
};

const text = (detail: AuditDetail, key: string): string => {
  const value = detail[key];
  return typeof value === 'string' ? value : '';
};
const cents = (detail: AuditDetail, key: string): string => {
  const value = detail[key];
  return typeof value === 'number' && Number.isInteger(value) ? money(value) : '';
};
const role = (detail: AuditDetail, key: string): string => ROLE_LABELS[text(detail, key) as Role] ?? text(detail, key);
/** Joins the parts that are there with " · ", so a missing reason leaves no stray separator. */
const parts = (...values: string[]) => values.filter(Boolean).join(' · ');

/** One line in words for the log's "What" column, from the entry's detail. */
export function describeEntry(entry: AuditEntry): string {
  const { detail } = entry;
  switch (entry.action) {
    case 'sign-in':
      return text(detail, 'via') === 'password-link'
        ? `Set a password from a link, as ${role(detail, 'role')}`
        : `As ${role(detail, 'role')}`;
    case 'sign-in-failed':
      return upperFirst(REFUSALS[text(detail, 'reason')] ?? text(detail, 'reason'));
    case 'user-invited':
      return `${text(detail, 'email')} as ${role(detail, 'role')}`;
    case 'role-changed':
      return `${text(detail, 'email')}: ${role(detail, 'from')} → ${role(detail, 'to')}`;
    case 'user-deactivated':
    case 'user-reactivated':
      return `${text(detail, 'email')} (${role(detail, 'role')})`;
    case 'price-override':
      return parts(`${cents(detail, 'fromCents')} → ${cents(detail, 'toCents')}`, text(detail, 'reason'));
    case 'invoice-voided':
      return parts(`${text(detail, 'number')}, ${cents(detail, 'totalCents')}`, text(detail, 'reason'));
    case 'credit-note-issued':
      return parts(
        `${text(detail, 'number')} on ${text(detail, 'invoiceNumber')}: ${cents(detail, 'amountCents')}`,
        REFUND_METHOD_LABELS[text(detail, 'refundMethod') as RefundMethod] ?? '',
        text(detail, 'reason'),
      );
    case 'payment-recorded':
      return parts(
        `${cents(detail, 'amountCents')} ${PAID[text(detail, 'method') as InvoicePaymentMethod] ?? text(detail, 'method')}`,
        text(detail, 'invoiceNumber') ? `on ${text(detail, 'invoiceNumber')}` : 'on site',
        text(detail, 'reference') ? `ref. ${text(detail, 'reference')}` : '',
      );
  }
}
