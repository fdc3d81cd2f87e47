import { Routes } from '@angular/router';
import { roleGuard } from '../../core/auth/role-guard';

/** The moderation desk, for moderators and admins (the server checks again on every request). */
export const MODERATION_ROUTES: Routes = [
  {
    path: '',
    canActivate: [roleGuard('moderator', 'admin')],
    loadComponent: () => import('./desk-shell/desk-shell').then((m) => m.DeskShell),
    children: [
      { path: '', pathMatch: 'full', redirectTo: 'reports' },
      { path: 'reports', title: 'Reports · Moderation', data: { list: 'queue' }, loadComponent: () => import('./report-queue/cases-page').then((m) => m.CasesPage) },
      { path: 'hidden', title: 'Hidden items · Moderation', data: { list: 'hidden' }, loadComponent: () => import('./report-queue/cases-page').then((m) => m.CasesPage) },
      { path: 'showcase', title: 'Showcase · Moderation', loadComponent: () => import('./showcase-curation/showcase-curation-page').then((m) => m.ShowcaseCurationPage) },
      { path: 'audit', title: 'Audit log · Moderation', loadComponent: () => import('./audit-log/audit-log-page').then((m) => m.AuditLogPage) },
    ],
  },
];
