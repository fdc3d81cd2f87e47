import { Routes } from '@angular/router';
import { authGuard } from '../../core/auth/auth-guard';

export const RACK_ROUTES: Routes = [
  { path: '', pathMatch: 'full', title: 'Your rosette rack', canActivate: [authGuard], loadComponent: () => import('./rack-page/rack-page').then((m) => m.RackPage) },
  { path: 'sweep', title: 'Sweep your rack', canActivate: [authGuard], loadComponent: () => import('../sweep/sweep-page/sweep-page').then((m) => m.SweepPage) },
  { path: 'sweep/:id', title: 'Sweep your rack', canActivate: [authGuard], loadComponent: () => import('../sweep/sweep-page/sweep-page').then((m) => m.SweepPage) },
  { path: 'measured', title: 'Measured rosette', canActivate: [authGuard], loadComponent: () => import('../rosettes/measured-page/measured-page').then((m) => m.MeasuredPage) },
];
