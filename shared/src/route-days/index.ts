export * from './arrival-window.js';
