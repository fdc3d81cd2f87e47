import { EventEmitter } from 'node:events';
import type { Role } from '@barwright/contracts';

/**
 * Told when the open-report count changes and when an account's role or suspension changes, so
 * the moderation socket can update the desks and end the sockets of someone who lost the role.
 */
export class ModerationEvents extends EventEmitter<{
  queue: [{ openReports: number }];
  account: [{ userId: string; role: Role; suspended: boolean }];
}> {}
