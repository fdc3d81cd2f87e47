import { Routes } from '@angular/router';

export const MAILBOX_ROUTES: Routes = [
  { path: '', title: 'Mailbox', loadComponent: () => import('./mailbox-page/mailbox-page').then((m) => m.MailboxPage) },
];
