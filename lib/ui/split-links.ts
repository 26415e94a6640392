export type TextPiece = { kind: 'text' | 'link'; value: string };

const urlPattern = /https?:\/\/[^\s<>"')\]]+/g;

/** Splits plain text into text and http(s) link pieces, so links in a message can be tapped. */
export function splitLinks(text: string): TextPiece[] {
  const pieces: TextPiece[] = [];
  let last = 0;
  for (const match of text.matchAll(urlPattern)) {
    const url = match[0].replace(/[.,;:!?]+$/, '');
    const start = match.index;
    if (start > last) pieces.push({ kind: 'text', value: text.slice(last, start) });
    pieces.push({ kind: 'link', value: url });
    last = start + url.length;
  }
  if (last < text.length) pieces.push({ kind: 'text', value: text.slice(last) });
  return pieces;
}
