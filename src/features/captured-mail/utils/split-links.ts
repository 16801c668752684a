export type TextPiece = { kind: 'text'; text: string } | { kind: 'link'; href: string };

const LINK_PATTERN = /https?:\/\/[^\s<>"']+/g;
/** Punctuation that ends a sentence rather than a link ("…at http://host/x."). */
const TRAILING_PUNCTUATION = /[.,;:!?)\]]+$/;

/** Splits plain mail text into text and http(s) links, so the links can be made clickable. */
export function splitLinks(text: string): TextPiece[] {
  const pieces: TextPiece[] = [];
  let position = 0;
  for (const match of text.matchAll(LINK_PATTERN)) {
    const href = match[0].replace(TRAILING_PUNCTUATION, '');
    const start = match.index;
    if (start > position) pieces.push({ kind: 'text', text: text.slice(position, start) });
    pieces.push({ kind: 'link', href });
    position = start + href.length;
  }
  if (position < text.length) pieces.push({ kind: 'text', text: text.slice(position) });
  return pieces;
}
