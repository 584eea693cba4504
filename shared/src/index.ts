export * from './roles.js';
export * from './shears.js';
export * from './passwords.js';
