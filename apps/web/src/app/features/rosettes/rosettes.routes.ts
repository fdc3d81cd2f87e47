import { Routes } from '@angular/router';
import { authGuard } from '../../core/auth/auth-guard';

export const ROSETTES_ROUTES: Routes = [
  { path: '', pathMatch: 'full', redirectTo: 'measured' },
  { path: 'measured', title: 'Measured rosette', canActivate: [authGuard], loadComponent: () => import('./measured-page/measured-page').then((m) => m.MeasuredPage) },
];
