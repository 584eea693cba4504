// Own keys, apart from the office pages' ['invoices', …]: the portal and the pay link are read by other people.
export const payLinkKeys = {
  invoice: (token: string) => ['pay-link', token, 'invoice'] as const,
  status: (token: string) => ['pay-link', token, 'status'] as const,
};

export const myInvoiceKeys = {
  all: ['my-invoices'] as const,
  list: (page: number, pageSize: number) => ['my-invoices', 'list', { page, pageSize }] as const,
  detail: (id: string) => ['my-invoices', 'detail', id] as const,
};

export const payLinkPath = (token: string) => `/public/invoices/${encodeURIComponent(token)}`;
export const myInvoicePath = (id: string) => `/invoices/${encodeURIComponent(id)}`;
