import { describe, expect, it } from 'vitest';
import { splitLinks } from './split-links';

describe('splitLinks', () => {
  it('finds the invitation link in a mail body', () => {
    const text = 'Hello Ana,\n\nOpen http://127.0.0.1:4000/invitation/abc_DEF-123 to join.\n';
    expect(splitLinks(text)).toEqual([
      { kind: 'text', text: 'Hello Ana,\n\nOpen ' },
      { kind: 'link', href: 'http://127.0.0.1:4000/invitation/abc_DEF-123' },
      { kind: 'text', text: ' to join.\n' },
    ]);
  });

  it('leaves sentence punctuation out of the link', () => {
    expect(splitLinks('Go to https://lab.example/reset-password/xyz.')).toEqual([
      { kind: 'text', text: 'Go to ' },
      { kind: 'link', href: 'https://lab.example/reset-password/xyz' },
      { kind: 'text', text: '.' },
    ]);
  });

  it('returns plain text untouched and nothing for an empty body', () => {
    expect(splitLinks('No links here.')).toEqual([{ kind: 'text', text: 'No links here.' }]);
    expect(splitLinks('')).toEqual([]);
  });

  it('keeps every character of the text, in order', () => {
    const text = 'a http://x.example/1 b https://y.example/2, c';
    const joined = splitLinks(text)
      .map((piece) => (piece.kind === 'link' ? piece.href : piece.text))
      .join('');
    expect(joined).toBe(text);
  });
});
