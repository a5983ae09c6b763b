export { start, stop, type Running } from './server.js';
export { buildApp } from './app.js';
export { loadConfig, type Config } from './config.js';
