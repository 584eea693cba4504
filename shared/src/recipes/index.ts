export * from './types.js';
export * from './cautions.js';
export * from './default-table.js';
export * from './edit-table.js';
export * from './edge-recipe.js';
