import type { InvoiceListParams } from '../types';

export const invoiceKeys = {
  all: ['invoices'] as const,
  lists: ['invoices', 'list'] as const,
  list: (params: InvoiceListParams) => ['invoices', 'list', params] as const,
  detail: (id: string) => ['invoices', 'detail', id] as const,
  mails: (id: string) => ['invoices', 'mails', id] as const,
  ready: ['invoices', 'ready'] as const,
};

// Not under ['invoices']: an invoice change must not fetch the profile and its logo again.
export const businessProfileKeys = {
  profile: ['business-profile'] as const,
  logo: (logoUrl: string) => ['business-profile', 'logo', logoUrl] as const,
};

export const invoicePath = (id: string) => `/invoices/${encodeURIComponent(id)}`;
