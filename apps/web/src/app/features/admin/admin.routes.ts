import { Routes } from '@angular/router';
import { roleGuard } from '../../core/auth/role-guard';

export const ADMIN_ROUTES: Routes = [
  { path: '', pathMatch: 'full', redirectTo: 'people' },
  { path: 'people', title: 'People', canActivate: [roleGuard('admin')], loadComponent: () => import('./people/people-page').then((m) => m.PeoplePage) },
];
