import { Routes } from '@angular/router';
import { authGuard } from '../../core/auth/auth-guard';

export const NOTIFICATIONS_ROUTES: Routes = [
  { path: '', pathMatch: 'full', title: 'Notifications', canActivate: [authGuard], loadComponent: () => import('./notifications-page/notifications-page').then((m) => m.NotificationsPage) },
];
