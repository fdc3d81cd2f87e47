import { EventEmitter } from 'node:events';
import type { Notification } from '@barwright/contracts';

/** Told of every new notification and unread-count change, so the socket gateway can push them to the user's room. */
export class NotificationEvents extends EventEmitter<{
  created: [{ userId: string; notification: Notification; unread: number }];
  unread: [{ userId: string; unread: number }];
}> {}
