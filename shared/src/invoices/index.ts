export * from './price-invoice.js';
export * from './invoice-lines.js';
export * from './due-date.js';
