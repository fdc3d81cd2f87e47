import { Component } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { MATERIAL_ANIMATIONS } from '@angular/material/core';
import { MatProgressBarModule } from '@angular/material/progress-bar';
import { describe, expect, it } from 'vitest';
import { KeepMotion } from './keep-motion';

/** A part of the app with Material's animations off, as the studio is, holding two progress bars. */
@Component({
  imports: [KeepMotion, MatProgressBarModule],
  providers: [{ provide: MATERIAL_ANIMATIONS, useValue: { animationsDisabled: true } }],
  template: `
    <mat-progress-bar data-testid="still" mode="indeterminate" />
    <mat-progress-bar data-testid="moving" bwKeepMotion mode="indeterminate" />
  `,
})
class StillPart {}

describe('KeepMotion', () => {
  it('keeps an indeterminate progress bar moving where an ancestor turned animations off', async () => {
    const fixture = TestBed.createComponent(StillPart);
    await fixture.whenStable();
    const bar = (id: string) => (fixture.nativeElement as HTMLElement).querySelector(`[data-testid="${id}"]`)!;
    expect(bar('still').classList).toContain('_mat-animation-noopable');
    expect(bar('moving').classList).not.toContain('_mat-animation-noopable');
    expect(bar('moving').classList).toContain('mdc-linear-progress--animation-ready');
  });
});
