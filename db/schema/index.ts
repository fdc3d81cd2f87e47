export * from './users';
export * from './sessions';
export * from './boards';
export * from './community';
export * from './shop-log';
export * from './notifications';
export * from './moderation';
export * from './rack';
