export * from './design';
export * from './api-error';
export * from './auth';
