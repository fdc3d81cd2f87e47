import { describe, expect, it } from 'vitest';
import { framedMailHtml } from './framed-mail-html';

describe('framedMailHtml', () => {
  it('puts the base element first inside an existing head', () => {
    expect(framedMailHtml('<!doctype html><html><head lang="en"><title>x</title></head><body>b</body></html>')).toBe(
      '<!doctype html><html><head lang="en"><base target="_top"><title>x</title></head><body>b</body></html>',
    );
  });

  it('prefixes a fragment', () => {
    expect(framedMailHtml('<p>Hello</p>')).toBe('<base target="_top"><p>Hello</p>');
  });

  it('does not mistake <header> for <head>', () => {
    expect(framedMailHtml('<header>h</header>')).toBe('<base target="_top"><header>h</header>');
  });
});
