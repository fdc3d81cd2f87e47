import { Routes } from '@angular/router';

// The measured-rosette import lives under the rack now; old addresses still arrive there.
export const ROSETTES_ROUTES: Routes = [
  { path: '', pathMatch: 'full', redirectTo: '/rack/measured' },
  { path: 'measured', redirectTo: '/rack/measured' },
];
