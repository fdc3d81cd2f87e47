export * from './users';
export * from './sessions';
export * from './boards';
