export * from './errors/api-error.js';
export * from './auth/auth.types.js';
export * from './users/users.types.js';
export * from './time/temperature.js';
export * from './time/time-zone.js';
export const APP_NAME = 'Broodsilk';
