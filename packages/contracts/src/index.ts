export * from './design';
export * from './design-labels';
export * from './api-error';
export * from './auth';
export * from './boards';
export * from './design-presets';
export * from './instant';
// The community: publishing, explore, ratings, comments, remix, shop log, notifications.
export * from './entries';
export * from './ratings';
export * from './comments';
export * from './comment-html';
export * from './remix';
export * from './design-diff';
export * from './shop-log';
export * from './measured-rosette';
export * from './notifications';
export * from './socket-events';
// Moderation: reports and the desk, the showcase, the audit log.
export * from './moderation';
export * from './showcase';
export * from './audit';
// The rosette rack, the sweep, votes.
export * from './rack';
export * from './sweep';
export * from './vote';
