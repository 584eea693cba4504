export * from './stops.js';
export * from './weekdays.js';
export * from './tag-codes.js';
export * from './shear-status.js';
export * from './coming-due.js';
