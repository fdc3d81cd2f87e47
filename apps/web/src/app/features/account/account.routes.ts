import { Routes } from '@angular/router';
import { authGuard } from '../../core/auth/auth-guard';

export const ACCOUNT_ROUTES: Routes = [
  { path: '', pathMatch: 'full', redirectTo: 'profile' },
  { path: 'sign-in', title: 'Sign in', loadComponent: () => import('./sign-in/sign-in-page').then((m) => m.SignInPage) },
  { path: 'sign-up', title: 'Create an account', loadComponent: () => import('./sign-up/sign-up-page').then((m) => m.SignUpPage) },
  // The verification and reset links in our mails point at these two paths; keep them.
  { path: 'verify', title: 'Verify e-mail', loadComponent: () => import('./verify/verify-page').then((m) => m.VerifyPage) },
  { path: 'reset', title: 'Choose a new password', loadComponent: () => import('./reset-password/reset-password-page').then((m) => m.ResetPasswordPage) },
  { path: 'forgot-password', title: 'Forgot password', loadComponent: () => import('./forgot-password/forgot-password-page').then((m) => m.ForgotPasswordPage) },
  { path: 'profile', title: 'Profile', canActivate: [authGuard], loadComponent: () => import('./profile/profile-page').then((m) => m.ProfilePage) },
];
