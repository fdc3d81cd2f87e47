/**
 * Comment text as an HTML fragment: every character escaped, line breaks as `<br>`, and http(s)
 * addresses turned into links that open in a new tab and pass no ranking or opener (`rel` as
 * recommended for user-generated content). Nothing else of the text can become markup.
 */

const ESCAPES: Record<string, string> = { '&': '&amp;', '<': '&lt;', '>': '&gt;', '"': '&quot;', "'": '&#39;', '`': '&#96;' };

/** Escapes text for an HTML text node or a quoted attribute value. */
export function escapeHtml(text: string): string {
  return text.replace(/[&<>"'`]/g, (c) => ESCAPES[c]);
}

/** Candidate addresses: the scheme, then everything up to white space or a character that cannot end a bare URL in prose. */
const URL_CANDIDATE = /\bhttps?:\/\/[^\s<>"'`]+/gi;
/** Punctuation that usually closes the sentence rather than the address. */
const TRAILING = /[.,;:!?'")\]}]+$/;

export const COMMENT_LINK_REL = 'nofollow noopener noreferrer ugc';

/** The address without trailing sentence punctuation, keeping a closing bracket the address opened. */
function trimUrl(candidate: string): string {
  let url = candidate.replace(TRAILING, '');
  const rest = candidate.slice(url.length);
  // "(see https://x.test/a_(b))" keeps the ")" that belongs to the address.
  for (const ch of rest) {
    const open = ch === ')' ? '(' : ch === ']' ? '[' : undefined;
    if (!open || count(url, open) <= count(url, ch)) break;
    url += ch;
  }
  return url;
}

const count = (s: string, ch: string) => s.split(ch).length - 1;

function safeHref(url: string): string | undefined {
  try {
    const parsed = new URL(url);
    return parsed.protocol === 'http:' || parsed.protocol === 'https:' ? parsed.href : undefined;
  } catch {
    return undefined;
  }
}

const textHtml = (text: string) => escapeHtml(text).replace(/\r\n|\r|\n/g, '<br>');

/** Renders a comment's plain text as safe HTML (pure; the same on server and client). */
export function renderCommentHtml(text: string): string {
  let html = '';
  let last = 0;
  for (const match of text.matchAll(URL_CANDIDATE)) {
    const url = trimUrl(match[0]);
    const href = safeHref(url);
    if (!href) continue;
    html += textHtml(text.slice(last, match.index));
    html += `<a href="${escapeHtml(href)}" rel="${COMMENT_LINK_REL}" target="_blank">${escapeHtml(url)}</a>`;
    last = match.index + url.length;
  }
  return html + textHtml(text.slice(last));
}
