import { Routes } from '@angular/router';
import { authGuard } from '../../core/auth/auth-guard';

export const STUDIO_ROUTES: Routes = [
  { path: '', pathMatch: 'full', redirectTo: '/boards' },
  { path: ':designId', title: 'Studio', canActivate: [authGuard], loadComponent: () => import('./design-editor/design-editor-page').then((m) => m.DesignEditorPage) },
];
