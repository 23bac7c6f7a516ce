export * from './organisation.js';
export * from './branches.js';
export * from './auth.js';
export * from './events.js';
export * from './migrations-folder.js';
