export * from './users';
export * from './sessions';
