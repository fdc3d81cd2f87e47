export * from './design';
export * from './api-error';
export * from './auth';
export * from './boards';
export * from './design-presets';
