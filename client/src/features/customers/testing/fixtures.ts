import type { CustomerDetail, CustomerSummary } from '../types';

// Invented demo people and places, as all Keenroute demo data is.
export const stopRiverside = { id: 's-riverside', name: 'Riverside Cuts', city: 'Demo City' };
export const stopPaws = { id: 's-paws', name: 'Paws & Tails Grooming', city: 'Demo City' };

export const customerMira: CustomerSummary = {
  id: 'c-mira',
  name: 'Mira Stylist',
  email: 'mira@demo.keenroute.test',
  phone: '555-0101',
  stop: { id: stopRiverside.id, name: stopRiverside.name },
  shearCount: 3,
  visitNoticeConsent: true,
  active: true,
  hasAccount: true,
};

export const customerTeo: CustomerSummary = {
  id: 'c-teo',
  name: 'Teo Groomer',
  email: null,
  phone: null,
  stop: { id: stopPaws.id, name: stopPaws.name },
  shearCount: 0,
  visitNoticeConsent: false,
  active: true,
  hasAccount: false,
};

export const miraDetail: CustomerDetail = {
  ...customerMira,
  notes: 'Prefers mornings.',
  user: { id: 'u-client', email: 'mira@demo.keenroute.test' },
  stopHistory: [
    { stop: { id: stopPaws.id, name: stopPaws.name }, startedAt: '2024-03-01', endedAt: '2025-01-15' },
    { stop: { id: stopRiverside.id, name: stopRiverside.name }, startedAt: '2025-01-15', endedAt: null },
  ],
  createdAt: '2024-03-01T09:00:00.000Z',
  updatedAt: '2025-01-15T09:00:00.000Z',
};

export const pageOf = <T>(items: T[], total = items.length) => ({ status: 200, body: { items, total } });
