import { Routes } from '@angular/router';
import { authGuard } from '../../core/auth/auth-guard';

export const BOARDS_ROUTES: Routes = [
  { path: '', pathMatch: 'full', title: 'Boards', canActivate: [authGuard], loadComponent: () => import('./board-list/board-list-page').then((m) => m.BoardListPage) },
  // The invitation mail links here; signed-out visitors sign in first and come back.
  {
    path: 'invitations/accept',
    title: 'Accept invitation',
    canActivate: [authGuard],
    loadComponent: () => import('./invitation-accept/invitation-accept-page').then((m) => m.InvitationAcceptPage),
  },
  { path: ':boardId', title: 'Board', canActivate: [authGuard], loadComponent: () => import('./board-page/board-page').then((m) => m.BoardPage) },
];
