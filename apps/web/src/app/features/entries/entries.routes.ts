import { Routes } from '@angular/router';

export const ENTRIES_ROUTES: Routes = [
  { path: '', pathMatch: 'full', redirectTo: '/explore' },
  // Readable by visitors too; what needs a session (rating, comments, remix, uploads) asks for it in place.
  { path: ':entryId', title: 'Bar design', loadComponent: () => import('./entry-page/entry-page').then((m) => m.EntryPage) },
];
