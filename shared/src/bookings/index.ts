export * from './capacity.js';
export * from './cutoff.js';
