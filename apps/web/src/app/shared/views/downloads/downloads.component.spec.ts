import { TestBed } from '@angular/core/testing';
import { describe, expect, it } from 'vitest';
import { DESIGN_DOWNLOADS, Downloads } from './downloads';

describe('Downloads', () => {
  it('lists every format', async () => {
    const fixture = TestBed.createComponent(Downloads);
    await fixture.whenStable();
    const items = [...(fixture.nativeElement as HTMLElement).querySelectorAll('li')];
    expect(items).toHaveLength(DESIGN_DOWNLOADS.length);
  });
});
