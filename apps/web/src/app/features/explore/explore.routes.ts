import { Routes } from '@angular/router';

export const EXPLORE_ROUTES: Routes = [
  { path: '', pathMatch: 'full', title: 'Explore', loadComponent: () => import('./explore-page/explore-page').then((m) => m.ExplorePage) },
];
