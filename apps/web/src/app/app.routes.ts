import { Routes } from '@angular/router';
import { localMailGuard } from './features/mailbox/local-mail-guard';

export const routes: Routes = [
  { path: '', pathMatch: 'full', title: 'Home', loadComponent: () => import('./features/home/home-page/home-page').then((m) => m.HomePage) },
  { path: 'account', loadChildren: () => import('./features/account/account.routes').then((m) => m.ACCOUNT_ROUTES) },
  { path: 'admin', loadChildren: () => import('./features/admin/admin.routes').then((m) => m.ADMIN_ROUTES) },
  { path: 'boards', loadChildren: () => import('./features/boards/boards.routes').then((m) => m.BOARDS_ROUTES) },
  { path: 'studio', loadChildren: () => import('./features/studio/studio.routes').then((m) => m.STUDIO_ROUTES) },
  // The community: Explore, the design page of published entries, notifications, measured rosettes.
  { path: 'explore', loadChildren: () => import('./features/explore/explore.routes').then((m) => m.EXPLORE_ROUTES) },
  { path: 'entries', loadChildren: () => import('./features/entries/entries.routes').then((m) => m.ENTRIES_ROUTES) },
  { path: 'notifications', loadChildren: () => import('./features/notifications/notifications.routes').then((m) => m.NOTIFICATIONS_ROUTES) },
  { path: 'rack', loadChildren: () => import('./features/rack/rack.routes').then((m) => m.RACK_ROUTES) },
  { path: 'votes', loadChildren: () => import('./features/votes/votes.routes').then((m) => m.VOTES_ROUTES) },
  { path: 'rosettes', loadChildren: () => import('./features/rosettes/rosettes.routes').then((m) => m.ROSETTES_ROUTES) },
  // Moderation: the desk (reports, hidden items, showcase curation, audit log), for moderators and admins.
  { path: 'moderation', loadChildren: () => import('./features/moderation/moderation.routes').then((m) => m.MODERATION_ROUTES) },
  { path: 'mailbox', canMatch: [localMailGuard], loadChildren: () => import('./features/mailbox/mailbox.routes').then((m) => m.MAILBOX_ROUTES) },
  { path: '**', title: 'Page not found', loadComponent: () => import('./features/not-found/not-found-page').then((m) => m.NotFoundPage) },
];
