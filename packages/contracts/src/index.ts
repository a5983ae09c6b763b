export * from './roles.js';
export * from './auth.js';
export * from './api-error.js';
export * from './workflow.js';
