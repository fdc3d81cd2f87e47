import { Directive } from '@angular/core';
import { MATERIAL_ANIMATIONS } from '@angular/material/core';

/**
 * Keeps Material's animations on the element it sits on where an ancestor turned them off (the studio
 * does, so its fields change at once while the views redraw): an indeterminate progress bar is its
 * motion, and standing still it would read as stuck part way.
 */
@Directive({
  selector: '[bwKeepMotion]',
  providers: [{ provide: MATERIAL_ANIMATIONS, useValue: { animationsDisabled: false } }],
})
export class KeepMotion {}
