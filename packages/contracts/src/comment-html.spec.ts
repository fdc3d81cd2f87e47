import { describe, expect, it } from 'vitest';
import { parseFragment } from 'parse5';
import { COMMENT_LINK_REL, renderCommentHtml } from './comment-html';

type Node = { nodeName: string; value?: string; attrs?: { name: string; value: string }[]; childNodes?: Node[] };
interface Element {
  tagName: string;
  attributes: { name: string; value: string }[];
  getAttribute(name: string): string | undefined;
  textContent: string;
}

/** Parses the fragment as a browser would, with an independent HTML parser (parse5, the WHATWG algorithm), and lists what it made. */
function parse(html: string) {
  const elements: Element[] = [];
  const text = (n: Node): string => (n.nodeName === '#text' ? n.value! : (n.childNodes ?? []).map(text).join(''));
  const walk = (n: Node) => {
    if (!n.nodeName.startsWith('#')) {
      const attrs = n.attrs ?? [];
      elements.push({ tagName: n.nodeName.toUpperCase(), attributes: attrs, getAttribute: (k) => attrs.find((a) => a.name === k)?.value, textContent: text(n) });
    }
    (n.childNodes ?? []).forEach(walk);
  };
  const root = parseFragment(html) as unknown as Node;
  walk(root);
  return { body: { textContent: text(root) }, elements, tags: elements.map((e) => e.tagName.toLowerCase()) };
}

const PAYLOADS = [
  '<script>alert(1)</script>',
  '<img src=x onerror=alert(1)>',
  '"><svg onload=alert(1)>',
  "javascript:alert(document.cookie)",
  '<a href="javascript:alert(1)">click</a>',
  'https://example.test/"onmouseover="alert(1)',
  "https://example.test/'><script>alert(1)</script>",
  'https://example.test/<img src=x onerror=alert(1)>',
  '<iframe src="https://example.test"></iframe>',
  '&lt;script&gt; already escaped',
  '<style>body{display:none}</style>',
  'data:text/html,<script>alert(1)</script>',
  '`${alert(1)}`',
];

describe('renderCommentHtml', () => {
  it.each(PAYLOADS)('keeps %s as text', (payload) => {
    const html = renderCommentHtml(payload);
    const { body, tags, elements } = parse(html);
    expect(tags.every((t) => t === 'a' || t === 'br')).toBe(true);
    for (const a of elements.filter((e) => e.tagName === 'A')) {
      expect(a.attributes.map((x) => x.name).sort()).toEqual(['href', 'rel', 'target']);
      expect(a.getAttribute('href')).toMatch(/^https?:\/\//);
    }
    expect(body.textContent).toBe(payload);
  });

  it('links http and https addresses safely and leaves sentence punctuation outside', () => {
    const text = 'See https://example.test/bars?id=3&x=1, or (http://example.test/a_(b)).';
    const { elements, body } = parse(renderCommentHtml(text));
    const links = elements.filter((e) => e.tagName === 'A');
    expect(links.map((a) => a.textContent)).toEqual(['https://example.test/bars?id=3&x=1', 'http://example.test/a_(b)']);
    expect(links[0].getAttribute('rel')).toBe(COMMENT_LINK_REL);
    expect(links[0].getAttribute('target')).toBe('_blank');
    expect(body.textContent).toBe(text);
  });

  it('does not link other schemes and keeps line breaks', () => {
    const { tags, body } = parse(renderCommentHtml('ftp://example.test\nmailto:a@example.test\r\nend'));
    expect(tags).toEqual(['br', 'br']);
    expect(body.textContent).toBe('ftp://example.testmailto:a@example.testend');
  });
});
