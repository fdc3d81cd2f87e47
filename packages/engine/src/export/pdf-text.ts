import type { PDFFont } from 'pdf-lib';

/**
 * Text the standard Helvetica font can show (WinAnsi): typographic marks are written plainly and
 * anything outside Latin-1 becomes '?'.
 */
export function winAnsiText(text: string): string {
  return text
    .replace(/[‘’]/g, "'")
    .replace(/[“”]/g, '"')
    .replace(/[–—]/g, '-')
    .replace(/×/g, 'x')
    .replace(/≈/g, '~')
    .replace(/[^\x20-\x7e\xa0-\xff]/g, '?');
}

/** Breaks text into lines no wider than `width` points at `size`. */
export function wrapText(text: string, font: PDFFont, size: number, width: number): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of winAnsiText(text).split(/\s+/).filter(Boolean)) {
    const candidate = line ? `${line} ${word}` : word;
    if (line && font.widthOfTextAtSize(candidate, size) > width) {
      lines.push(line);
      line = word;
    } else {
      line = candidate;
    }
  }
  if (line) lines.push(line);
  return lines;
}
