export * from './roles.js';
export * from './auth.js';
export * from './api-error.js';
export * from './workflow.js';
export * from './mail.js';
export * from './common-passwords.js';
export * from './reports.js';
