import { Routes } from '@angular/router';
import { authGuard } from '../../core/auth/auth-guard';

export const VOTES_ROUTES: Routes = [
  { path: ':id', title: 'Which would you cut?', canActivate: [authGuard], loadComponent: () => import('./vote-page/vote-page').then((m) => m.VotePage) },
];
