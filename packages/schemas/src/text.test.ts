import { describe, expect, it } from 'vitest';
import { isPlainText } from './text.js';

describe('plain text', () => {
  it('accepts ordinary text, accents, emoji (a surrogate pair) and line breaks', () => {
    for (const s of ['One box short', 'crème brûlée ring', 'sorry 🍩', 'line one\nline two', 'tab\there']) expect(isPlainText(s)).toBe(true);
  });
  it('refuses NUL and other C0 controls, DEL, and lone surrogates (Unicode Standard ch. 3, D91)', () => {
    for (const s of ['a\u0000b', '\u0007', 'x\u001b[31m', '\u007f', 'lone \ud800', 'lone \udfff', '\udfff\ud800']) expect(isPlainText(s)).toBe(false);
  });
});
