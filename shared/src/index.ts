export * from './roles.js';
export * from './errors.js';
export * from './units.js';
export * from './auth.js';
export * from './crews.js';
export * from './taxonomy.js';
export * from './journal.js';
