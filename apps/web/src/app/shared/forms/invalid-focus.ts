import { afterNextRender, ElementRef, inject, Injector } from '@angular/core';

const INVALID_FIELD = '.ng-invalid:is(input, textarea, mat-select, mat-radio-group)';

/**
 * For a component with a form: returns a function that, after the next render, moves keyboard focus to the
 * first field with a problem, so a keyboard or screen-reader user lands on the message. Call it from a submit handler.
 */
export function injectInvalidFocus(): () => void {
  const host = inject<ElementRef<HTMLElement>>(ElementRef);
  const injector = inject(Injector);
  return () => {
    afterNextRender(() => host.nativeElement.querySelector<HTMLElement>(INVALID_FIELD)?.focus(), { injector });
  };
}
