import { describe, expect, it } from 'vitest';
import { FRAME_HEAD, framedMailHtml } from './framed-mail-html';

describe('framedMailHtml', () => {
  it('puts the frame head first inside an existing head', () => {
    expect(framedMailHtml('<!doctype html><html><head lang="en"><title>x</title></head><body>b</body></html>')).toBe(
      `<!doctype html><html><head lang="en">${FRAME_HEAD}<title>x</title></head><body>b</body></html>`,
    );
  });

  it('prefixes a fragment', () => {
    expect(framedMailHtml('<p>Hello</p>')).toBe(`${FRAME_HEAD}<p>Hello</p>`);
  });

  it('does not mistake <header> for <head>', () => {
    expect(framedMailHtml('<header>h</header>')).toBe(`${FRAME_HEAD}<header>h</header>`);
  });

  it('sends links to the whole page and lets long addresses break', () => {
    expect(FRAME_HEAD).toContain('<base target="_top">');
    expect(FRAME_HEAD).toContain('overflow-wrap:anywhere');
  });
});
