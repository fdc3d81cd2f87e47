/**
 * The HTML part prepared for a sandboxed `srcdoc` frame: a `<base target="_top">` makes a followed link replace
 * this whole page (the sandbox allows that only on a user's click), instead of loading inside the small frame.
 */
export function framedMailHtml(html: string): string {
  const base = '<base target="_top">';
  const head = /<head(\s[^>]*)?>/i.exec(html);
  if (head) return html.slice(0, head.index + head[0].length) + base + html.slice(head.index + head[0].length);
  return base + html;
}
