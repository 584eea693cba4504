export * from './rate-card.js';
export * from './demo-rate-card.js';
export * from './validate-rate-card.js';
export * from './price-ticket.js';
