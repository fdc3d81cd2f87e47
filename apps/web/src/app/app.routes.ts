import { Routes } from '@angular/router';
import { localMailGuard } from './features/mailbox/local-mail-guard';

export const routes: Routes = [
  { path: '', pathMatch: 'full', title: 'Home', loadComponent: () => import('./features/home/home-page/home-page').then((m) => m.HomePage) },
  { path: 'account', loadChildren: () => import('./features/account/account.routes').then((m) => m.ACCOUNT_ROUTES) },
  { path: 'admin', loadChildren: () => import('./features/admin/admin.routes').then((m) => m.ADMIN_ROUTES) },
  { path: 'boards', loadChildren: () => import('./features/boards/boards.routes').then((m) => m.BOARDS_ROUTES) },
  { path: 'studio', loadChildren: () => import('./features/studio/studio.routes').then((m) => m.STUDIO_ROUTES) },
  { path: 'mailbox', canMatch: [localMailGuard], loadChildren: () => import('./features/mailbox/mailbox.routes').then((m) => m.MAILBOX_ROUTES) },
  { path: '**', title: 'Page not found', loadComponent: () => import('./features/not-found/not-found-page').then((m) => m.NotFoundPage) },
];
