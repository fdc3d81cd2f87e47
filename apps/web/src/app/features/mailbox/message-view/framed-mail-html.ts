/**
 * What the frame adds before the mail: a `<base target="_top">`, so a followed link replaces this whole page (the
 * sandbox allows that only on a user's click) instead of loading inside the small frame; and a style that keeps
 * the mail within the frame's width on a phone (a long address breaks anywhere, tables and pictures shrink).
 */
export const FRAME_HEAD =
  '<base target="_top"><style>body{overflow-wrap:anywhere;word-break:break-word}table,img{max-width:100%!important}</style>';

/** The HTML part prepared for a sandboxed `srcdoc` frame: FRAME_HEAD first inside the head, or before a fragment. */
export function framedMailHtml(html: string): string {
  const head = /<head(\s[^>]*)?>/i.exec(html);
  if (head) return html.slice(0, head.index + head[0].length) + FRAME_HEAD + html.slice(head.index + head[0].length);
  return FRAME_HEAD + html;
}
